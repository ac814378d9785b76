import { lockerItemKinds, type ItemKind } from '@gramwatt/shared';
import { useCallback, useMemo, useState, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button, buttonClasses } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { EmptyState } from '@/components/ui/empty-state';
import { Select } from '@/components/ui/select';
import { PageSpinner } from '@/components/ui/spinner';
import { env } from '@/config/env';
import { useLockerItems } from '../api/get-locker-items';
import type { LockerItem } from '../api/types';
import { undoWindowMs, useDeferredDelete } from '../hooks/use-deferred-delete';
import { formatGrams } from '../utils/format';
import { kindPluralLabels } from '../utils/labels';
import { totalGramsOf } from '../utils/power-roles';
import { ImportDialog } from './import-dialog';
import { ItemPanel, type ItemPanelState } from './item-panel';
import { LockerTable } from './locker-table';
import { UndoToasts } from './undo-toasts';

export interface LockerScreenProps {
  /** Where the reference catalogue lives (a link; the catalogue is its own feature). */
  catalogueHref: string;
  /** How long a deleted row can be brought back, ms. */
  undoMs?: number;
}

const kindFilterOptions = [
  { value: 'all', label: 'All kinds' },
  ...lockerItemKinds.map((kind) => ({ value: kind, label: kindPluralLabels[kind] })),
] as const;

function ShelfIllustration() {
  return (
    <svg
      viewBox="0 0 64 48"
      className="h-16 w-20"
      fill="none"
      stroke="currentColor"
      strokeWidth="2.5"
      strokeLinejoin="round"
    >
      <rect x="6" y="10" width="52" height="32" rx="5" />
      <path d="M22 10V6h20v4" />
      <path d="M6 22h52" strokeDasharray="4 4" />
    </svg>
  );
}

function Notice({ children, onDismiss }: { children: ReactNode; onDismiss: () => void }) {
  return (
    <Alert tone="done">
      <div className="flex items-start justify-between gap-4">
        <span>{children}</span>
        <button type="button" onClick={onDismiss} className="font-medium underline underline-offset-2">
          Dismiss
        </button>
      </div>
    </Alert>
  );
}

/**
 * The member's locker: every item grouped by power role with its grams, the power gear's total, a search box
 * and a kind filter; add and edit in a side panel, CSV import and export, delete with a short undo.
 */
export function LockerScreen({ catalogueHref, undoMs = undoWindowMs }: LockerScreenProps) {
  const locker = useLockerItems();
  const deferred = useDeferredDelete(undoMs);
  const [search, setSearch] = useState('');
  const [kind, setKind] = useState<ItemKind | 'all'>('all');
  const [panel, setPanel] = useState<ItemPanelState>({ mode: 'closed' });
  const [importOpen, setImportOpen] = useState(false);
  const [toDelete, setToDelete] = useState<LockerItem | null>(null);
  const [notice, setNotice] = useState<string | null>(null);

  const pendingIds = useMemo(() => new Set(deferred.pending.map((item) => item.id)), [deferred.pending]);
  const items = useMemo(
    () => (locker.data?.items ?? []).filter((item) => !pendingIds.has(item.id)),
    [locker.data, pendingIds],
  );
  // The open item follows the list, so a new photo shows up in the panel as soon as it is stored.
  const panelState: ItemPanelState =
    panel.mode === 'edit'
      ? { mode: 'edit', item: items.find((item) => item.id === panel.item.id) ?? panel.item }
      : panel;

  const onEdit = useCallback((item: LockerItem) => setPanel({ mode: 'edit', item }), []);
  const onDelete = useCallback((item: LockerItem) => setToDelete(item), []);

  if (locker.isPending) return <PageSpinner label="Loading your locker" />;
  if (locker.isError)
    return (
      <Alert tone="error" title="Could not load your locker">
        {locker.error.message}
      </Alert>
    );

  const totalG = totalGramsOf(items);
  const deviceCount = items.filter((item) => item.kind === 'device').length;
  const addButton = (
    <Button onClick={() => setPanel({ mode: 'add', kind: 'panel' })}>
      <svg viewBox="0 0 16 16" className="size-4" aria-hidden="true">
        <path d="M8 3v10M3 8h10" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
      </svg>
      Add gear
    </Button>
  );

  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap items-center gap-2">
        {addButton}
        <Button variant="secondary" onClick={() => setImportOpen(true)}>
          Import CSV
        </Button>
        {items.length > 0 && (
          <a href={`${env.apiUrl}/locker/export`} download className={buttonClasses('secondary')}>
            Export CSV
          </a>
        )}
        <Link to={catalogueHref} className={buttonClasses('quiet')}>
          Browse the catalogue
        </Link>
      </div>

      <div aria-live="polite">
        {notice && <Notice onDismiss={() => setNotice(null)}>{notice}</Notice>}
        {deferred.failure && (
          <Alert tone="error" title={`${deferred.failure.item.name} was not deleted`}>
            {deferred.failure.message} It is back in the list.{' '}
            <button type="button" onClick={deferred.dismissFailure} className="font-medium underline">
              Dismiss
            </button>
          </Alert>
        )}
      </div>

      {items.length === 0 ? (
        <EmptyState
          title="Nothing in your locker yet"
          illustration={<ShelfIllustration />}
          action={
            <div className="flex flex-wrap justify-center gap-2">
              <Link to={catalogueHref} className={buttonClasses('primary')}>
                Start from the catalogue
              </Link>
              <Button variant="secondary" onClick={() => setImportOpen(true)}>
                Import a CSV file
              </Button>
              <Button variant="secondary" onClick={() => setPanel({ mode: 'add', kind: 'panel' })}>
                Add an item by hand
              </Button>
            </div>
          }
        >
          <p>
            Put in the panels, banks, batteries, converters, controllers, leads and devices you own, with their grams
            and ports. Gramwatt plans every trip from this shelf. The catalogue has generic examples to copy and adjust.
          </p>
        </EmptyState>
      ) : (
        <>
          <div className="flex flex-col gap-4 rounded-xl border-2 border-scree-200 bg-white p-4 shadow-card sm:flex-row sm:items-end sm:justify-between">
            <div>
              <p className="text-sm font-medium text-scree-600">Power gear, everything you own</p>
              <p
                className="text-3xl font-semibold text-scree-950 tabular-nums"
                aria-label={`Locker total: ${formatGrams(totalG)}`}
              >
                {formatGrams(totalG)}
              </p>
              <p className="text-sm text-scree-600">
                {items.length} item{items.length === 1 ? '' : 's'}
                {deviceCount > 0 &&
                  `; the ${deviceCount} device${deviceCount === 1 ? ' is' : 's are'} carried anyway and not counted`}
              </p>
            </div>
            <div className="flex flex-col gap-3 sm:flex-row sm:items-end">
              <div className="flex flex-col gap-1.5">
                <label htmlFor="locker-search" className="text-sm font-medium text-scree-900">
                  Search
                </label>
                <input
                  id="locker-search"
                  type="search"
                  value={search}
                  onChange={(event) => setSearch(event.target.value)}
                  placeholder="Name, connector, watts…"
                  className="min-h-10 w-full rounded-lg border-2 border-scree-300 bg-white px-3 text-base text-scree-950 placeholder:text-scree-500 hover:border-scree-500 focus:border-tarn-600 focus:outline-none sm:w-64"
                />
              </div>
              <div className="flex flex-col gap-1.5">
                <label htmlFor="locker-kind" className="text-sm font-medium text-scree-900">
                  Kind
                </label>
                <Select
                  id="locker-kind"
                  options={kindFilterOptions}
                  value={kind}
                  onValueChange={(value) => setKind(value)}
                />
              </div>
            </div>
          </div>
          <LockerTable items={items} search={search} kind={kind} onEdit={onEdit} onDelete={onDelete} />
        </>
      )}

      <ItemPanel
        state={panelState}
        onClose={() => setPanel({ mode: 'closed' })}
        onSaved={(item, wasNew) => {
          setNotice(wasNew ? `${item.name} is in your locker.` : `${item.name} saved.`);
          // A new item stays open so a photo or spec sheet can be added straight away.
          setPanel(wasNew ? { mode: 'edit', item } : { mode: 'closed' });
        }}
      />
      <ImportDialog
        open={importOpen}
        onClose={() => setImportOpen(false)}
        currentItemCount={items.length}
        onImported={(result) =>
          setNotice(
            `${result.mode === 'replace' ? 'Locker replaced with' : 'Imported'} ${result.rowCount} item${result.rowCount === 1 ? '' : 's'}.`,
          )
        }
      />
      <Dialog
        open={toDelete !== null}
        onClose={() => setToDelete(null)}
        title={`Delete ${toDelete?.name ?? 'this item'}?`}
        description="It leaves your locker with its photo and spec sheet, and trips stop using it. You can undo for a few seconds."
        actions={
          <>
            <Button variant="secondary" onClick={() => setToDelete(null)}>
              Keep it
            </Button>
            <Button
              variant="danger"
              onClick={() => {
                if (toDelete) deferred.schedule(toDelete);
                setToDelete(null);
              }}
            >
              Delete
            </Button>
          </>
        }
      />
      <UndoToasts items={deferred.pending} onUndo={deferred.undo} />
    </div>
  );
}
