import type { CatalogueEntry, CatalogueEntryInput } from '@gramwatt/shared';
import {
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from '@tanstack/react-table';
import { useMemo, useState, type ComponentType } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { cn } from '@/components/ui/cn';
import { Dialog } from '@/components/ui/dialog';
import { EmptyState } from '@/components/ui/empty-state';
import { PageSpinner } from '@/components/ui/spinner';
import { useCatalogue } from '../api/get-catalogue';
import { useDeleteCatalogueEntry, useSaveCatalogueEntry } from '../api/manage-catalogue';
import type { GearPresenter } from './gear-presenter';

/** The editor the page supplies (the locker's per-kind item form in a side panel). */
export interface CatalogueEditorProps {
  open: boolean;
  /** The entry being changed, or null for a new one. */
  entry: CatalogueEntry | null;
  onClose: () => void;
  /** Sends the body; a thrown 400 ApiError carries field paths for the form. */
  onSubmit: (body: CatalogueEntryInput) => Promise<unknown>;
}

export interface CatalogueAdminProps {
  gear: GearPresenter;
  Editor: ComponentType<CatalogueEditorProps>;
}

type EditorState = { open: false } | { open: true; entry: CatalogueEntry | null };

/** Admins keep the reference catalogue: a sortable table of entries, add, edit and delete. */
export function CatalogueAdmin({ gear, Editor }: CatalogueAdminProps) {
  const catalogue = useCatalogue();
  const save = useSaveCatalogueEntry();
  const remove = useDeleteCatalogueEntry();
  const [editor, setEditor] = useState<EditorState>({ open: false });
  const [toDelete, setToDelete] = useState<CatalogueEntry | null>(null);
  const [outcome, setOutcome] = useState<{ tone: 'done' | 'error'; message: string } | null>(null);
  const [sorting, setSorting] = useState<SortingState>([]);

  const columns = useMemo<ColumnDef<CatalogueEntry>[]>(
    () => [
      { id: 'name', accessorFn: (entry) => entry.name, header: 'Name' },
      { id: 'kind', accessorFn: (entry) => gear.kindLabel(entry.kind), header: 'Kind' },
      { id: 'spec', accessorFn: (entry) => gear.specSummary(entry.spec), header: 'Spec', enableSorting: false },
      {
        id: 'massG',
        accessorFn: (entry) => entry.massG,
        header: 'Grams',
        sortDescFirst: true,
        cell: ({ getValue }) => gear.formatGrams(getValue<number>()),
      },
      {
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        enableSorting: false,
        cell: ({ row: { original: entry } }) => (
          <div className="flex justify-end gap-1">
            <Button
              variant="quiet"
              size="sm"
              onClick={() => setEditor({ open: true, entry })}
              aria-label={`Edit ${entry.name}`}
            >
              Edit
            </Button>
            <Button variant="quiet" size="sm" onClick={() => setToDelete(entry)} aria-label={`Delete ${entry.name}`}>
              Delete
            </Button>
          </div>
        ),
      },
    ],
    [gear],
  );

  const table = useReactTable({
    data: catalogue.data ?? [],
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (entry) => entry.id,
  });

  if (catalogue.isPending) return <PageSpinner label="Loading the catalogue" />;
  if (catalogue.isError)
    return (
      <Alert tone="error" title="Could not load the catalogue">
        {catalogue.error.message}
      </Alert>
    );

  const editing = editor.open ? editor.entry : null;
  return (
    <div className="flex flex-col gap-4">
      <div>
        <Button onClick={() => setEditor({ open: true, entry: null })}>Add an entry</Button>
      </div>
      <div aria-live="polite">
        {outcome && (
          <Alert tone={outcome.tone} title={outcome.tone === 'done' ? 'Saved' : 'Refused'}>
            {outcome.message}
          </Alert>
        )}
      </div>
      {catalogue.data.length === 0 ? (
        <EmptyState title="No catalogue entries yet">
          <p>Add generic example gear (no brand names) that members can copy into their lockers.</p>
        </EmptyState>
      ) : (
        <div
          tabIndex={0}
          role="region"
          aria-label="Catalogue table"
          className="relative overflow-x-auto rounded-xl border-2 border-scree-200 bg-white shadow-card"
        >
          <table className="w-full min-w-[40rem] border-collapse text-left text-sm">
            <caption className="sr-only">Catalogue entries; column headers sort the table</caption>
            <thead className="bg-firn-100 text-scree-700">
              {table.getHeaderGroups().map((group) => (
                <tr key={group.id}>
                  {group.headers.map((header) => {
                    const sorted = header.column.getIsSorted();
                    return (
                      <th
                        key={header.id}
                        scope="col"
                        aria-sort={
                          header.column.getCanSort()
                            ? sorted === 'asc'
                              ? 'ascending'
                              : sorted === 'desc'
                                ? 'descending'
                                : 'none'
                            : undefined
                        }
                        className={cn('px-4 py-3 font-semibold', header.column.id === 'massG' && 'text-right')}
                      >
                        {header.column.getCanSort() ? (
                          <button
                            type="button"
                            onClick={header.column.getToggleSortingHandler()}
                            className="hover:text-scree-950"
                          >
                            {flexRender(header.column.columnDef.header, header.getContext())}
                            <span aria-hidden="true">{sorted === 'asc' ? ' ↑' : sorted === 'desc' ? ' ↓' : ''}</span>
                          </button>
                        ) : (
                          flexRender(header.column.columnDef.header, header.getContext())
                        )}
                      </th>
                    );
                  })}
                </tr>
              ))}
            </thead>
            <tbody className="divide-y divide-firn-200">
              {table.getRowModel().rows.map((row) => (
                <tr key={row.id}>
                  {row.getVisibleCells().map((cell) =>
                    cell.column.id === 'name' ? (
                      <th key={cell.id} scope="row" className="px-4 py-2.5 font-medium text-scree-950">
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </th>
                    ) : (
                      <td
                        key={cell.id}
                        className={cn('px-4 py-2.5', cell.column.id === 'massG' && 'text-right tabular-nums')}
                      >
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </td>
                    ),
                  )}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      <Editor
        open={editor.open}
        entry={editing}
        onClose={() => setEditor({ open: false })}
        onSubmit={async (body) => {
          const saved = await save.mutateAsync({ entryId: editing?.id, body });
          setOutcome({ tone: 'done', message: `${saved.name} is in the catalogue.` });
          setEditor({ open: false });
        }}
      />
      <Dialog
        open={toDelete !== null}
        onClose={() => setToDelete(null)}
        title={`Delete ${toDelete?.name ?? 'this entry'}?`}
        description="Members can no longer copy it. Copies already in lockers stay as they are."
        actions={
          <>
            <Button variant="secondary" onClick={() => setToDelete(null)}>
              Keep it
            </Button>
            <Button
              variant="danger"
              onClick={() => {
                const entry = toDelete;
                setToDelete(null);
                if (!entry) return;
                remove.mutate(entry.id, {
                  onSuccess: () =>
                    setOutcome({ tone: 'done', message: `${entry.name} was deleted from the catalogue.` }),
                  onError: (error) => setOutcome({ tone: 'error', message: error.message }),
                });
              }}
            >
              Delete entry
            </Button>
          </>
        }
      />
    </div>
  );
}
