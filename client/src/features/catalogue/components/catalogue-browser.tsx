import type { CatalogueEntry, LockerItem } from '@gramwatt/shared';
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { PageSpinner } from '@/components/ui/spinner';
import { TextLink } from '@/components/ui/text-link';
import { useCatalogue } from '../api/get-catalogue';
import { useCopyCatalogueEntry } from '../api/copy-catalogue-entry';
import type { GearPresenter } from './gear-presenter';

export interface CatalogueBrowserProps {
  gear: GearPresenter;
  lockerHref: string;
  /** Shown to admins: where the catalogue is edited. */
  manageHref?: string;
  /** Called after a copy, so the page can refresh the locker. */
  onCopied?: (item: LockerItem) => void;
}

function EntryCard({
  entry,
  gear,
  added,
  isAdding,
  onAdd,
}: {
  entry: CatalogueEntry;
  gear: GearPresenter;
  added: boolean;
  isAdding: boolean;
  onAdd: () => void;
}) {
  return (
    <li className="flex flex-col justify-between gap-3 rounded-xl border-2 border-scree-200 bg-white p-4 shadow-card">
      <div>
        <h3 className="font-semibold text-scree-950">{entry.name}</h3>
        <p className="text-xs text-scree-600">
          {gear.kindLabel(entry.kind)} ·{' '}
          {entry.kind === 'device' && entry.massG === 0 ? 'no mass given' : gear.formatGrams(entry.massG)}
        </p>
        <p className="mt-2 text-sm text-scree-800">{gear.specSummary(entry.spec)}</p>
        {entry.notes && <p className="mt-1 text-sm text-scree-600">{entry.notes}</p>}
      </div>
      <div>
        {added ? (
          <p className="flex min-h-9 items-center gap-1.5 text-sm font-medium text-moss-800">
            <svg viewBox="0 0 16 16" className="size-4" aria-hidden="true">
              <path d="m3 8.5 3 3 7-7" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
            </svg>
            In your locker
          </p>
        ) : (
          <Button
            variant="secondary"
            size="sm"
            isLoading={isAdding}
            onClick={onAdd}
            aria-label={`Add ${entry.name} to my locker`}
          >
            Add to my locker
          </Button>
        )}
      </div>
    </li>
  );
}

/** The reference catalogue for members: generic gear by power role, each copied into the locker with one click. */
export function CatalogueBrowser({ gear, lockerHref, manageHref, onCopied }: CatalogueBrowserProps) {
  const catalogue = useCatalogue();
  const [search, setSearch] = useState('');
  const [added, setAdded] = useState<Record<string, string>>({});
  const [failure, setFailure] = useState<string | null>(null);
  const copy = useCopyCatalogueEntry({ onCopied });

  const entries = useMemo(() => {
    const needle = search.trim().toLowerCase();
    const all = catalogue.data ?? [];
    return needle
      ? all.filter((entry) =>
          [entry.name, entry.notes, gear.specSummary(entry.spec)].some((text) => text.toLowerCase().includes(needle)),
        )
      : all;
  }, [catalogue.data, search, gear]);

  if (catalogue.isPending) return <PageSpinner label="Loading the catalogue" />;
  if (catalogue.isError)
    return (
      <Alert tone="error" title="Could not load the catalogue">
        {catalogue.error.message}
      </Alert>
    );
  if (catalogue.data.length === 0)
    return (
      <EmptyState title="The catalogue is empty">
        <p>
          Admins keep generic example gear here.{' '}
          {manageHref ? (
            <TextLink to={manageHref}>Add the first entry</TextLink>
          ) : (
            'Ask one to add some, or add your own gear in the locker.'
          )}
        </p>
      </EmptyState>
    );

  const lastAdded = Object.values(added).at(-1);
  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-col gap-3 sm:flex-row sm:items-end sm:justify-between">
        <div className="flex flex-col gap-1.5">
          <label htmlFor="catalogue-search" className="text-sm font-medium text-scree-900">
            Search the catalogue
          </label>
          <input
            id="catalogue-search"
            type="search"
            value={search}
            onChange={(event) => setSearch(event.target.value)}
            className="min-h-10 w-full rounded-lg border-2 border-scree-300 bg-white px-3 text-base hover:border-scree-500 focus:border-tarn-600 focus:outline-none sm:w-72"
          />
        </div>
        {manageHref && (
          <Link to={manageHref} className="font-medium text-moss-700 underline decoration-2 underline-offset-2">
            Manage the catalogue
          </Link>
        )}
      </div>
      <div aria-live="polite">
        {lastAdded && (
          <Alert tone="done" title={`${lastAdded} is in your locker`}>
            Set how many you own and add a photo there. <TextLink to={lockerHref}>Open the locker</TextLink>
          </Alert>
        )}
        {failure && (
          <Alert tone="error" title="Could not add it">
            {failure}
          </Alert>
        )}
      </div>
      {entries.length === 0 && (
        <p role="status" className="text-scree-700">
          Nothing matches “{search.trim()}”.
        </p>
      )}
      {gear.groupByPowerRole(entries).map((group) => (
        <section key={group.role} aria-labelledby={`catalogue-${group.role}`}>
          <h2 id={`catalogue-${group.role}`} className="text-lg font-semibold text-scree-950">
            {group.label}
          </h2>
          <p className="mb-3 text-sm text-scree-600">{group.blurb}</p>
          <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
            {group.items.map((entry) => (
              <EntryCard
                key={entry.id}
                entry={entry}
                gear={gear}
                added={entry.id in added}
                isAdding={copy.isPending && copy.variables === entry.id}
                onAdd={() => {
                  setFailure(null);
                  copy.mutate(entry.id, {
                    onSuccess: (item) => setAdded((current) => ({ ...current, [entry.id]: item.name })),
                    onError: (error) => setFailure(error.message),
                  });
                }}
              />
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}
