import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type FilterFn,
  type SortingState,
} from '@tanstack/react-table';
import type { ItemKind } from '@gramwatt/shared';
import { useMemo, useState } from 'react';
import { Button } from '@/components/ui/button';
import { cn } from '@/components/ui/cn';
import type { LockerItem } from '../api/types';
import { formatGrams, formatNumber } from '../utils/format';
import { kindLabels, kindPluralLabels } from '../utils/labels';
import { countsTowardGrams, groupByPowerRole, totalGramsOf } from '../utils/power-roles';
import { specSummary } from '../utils/spec-summary';
import { ItemThumb } from './item-thumb';

export interface LockerTableProps {
  items: readonly LockerItem[];
  /** Text the name or the spec summary must contain (any case). */
  search: string;
  /** Only this kind, or every kind. */
  kind: ItemKind | 'all';
  onEdit: (item: LockerItem) => void;
  onDelete: (item: LockerItem) => void;
}

const matchesSearch: FilterFn<LockerItem> = (row, _columnId, value: string) => {
  const needle = value.trim().toLowerCase();
  if (!needle) return true;
  const item = row.original;
  return [item.name, item.notes, specSummary(item.spec), kindLabels[item.kind]].some((text) =>
    text.toLowerCase().includes(needle),
  );
};

const ariaSort = (sorted: false | 'asc' | 'desc') =>
  sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none';

function SortIcon({ sorted }: { sorted: false | 'asc' | 'desc' }) {
  return (
    <svg
      viewBox="0 0 12 16"
      className={cn('size-3.5', sorted ? 'text-scree-900' : 'text-scree-400')}
      aria-hidden="true"
    >
      <path
        d="m2 6 4-4 4 4"
        fill="none"
        stroke="currentColor"
        strokeWidth="1.6"
        opacity={sorted === 'desc' ? 0.3 : 1}
      />
      <path
        d="m2 10 4 4 4-4"
        fill="none"
        stroke="currentColor"
        strokeWidth="1.6"
        opacity={sorted === 'asc' ? 0.3 : 1}
      />
    </svg>
  );
}

/**
 * The locker as one table with a group of rows per power role (Collect, Store, Convert, Connect, Use), each with
 * its grams. Sorting applies inside every group; search and the kind filter hide rows, and empty groups go.
 */
export function LockerTable({ items, search, kind, onEdit, onDelete }: LockerTableProps) {
  const [sorting, setSorting] = useState<SortingState>([]);

  const columns = useMemo<ColumnDef<LockerItem>[]>(
    () => [
      {
        id: 'name',
        accessorFn: (item) => item.name,
        header: 'Name',
        sortingFn: (a, b) => a.original.name.localeCompare(b.original.name, undefined, { sensitivity: 'base' }),
        cell: ({ row: { original: item } }) => {
          const specSheet = item.files.find((file) => file.purpose === 'spec-sheet');
          return (
            <div className="flex items-center gap-3">
              <ItemThumb files={item.files} />
              <div className="min-w-0">
                <span className="block min-w-32 font-medium text-scree-950">{item.name}</span>
                <span className="block text-xs text-scree-600">
                  {kindLabels[item.kind]}
                  {/* On a phone the gram columns are off to the side: a short copy here (the cells say it to screen readers). */}
                  <span aria-hidden="true" className="sm:hidden">
                    {' · '}
                    {item.countOwned > 1 ? `${item.countOwned} × ${formatGrams(item.massG)}` : formatGrams(item.massG)}
                  </span>
                  {specSheet && (
                    <>
                      {' · '}
                      <a
                        href={specSheet.url}
                        target="_blank"
                        rel="noreferrer"
                        className="font-medium text-moss-700 underline underline-offset-2 hover:text-moss-900"
                      >
                        Spec sheet<span className="sr-only"> of {item.name} (opens in a new tab)</span>
                      </a>
                    </>
                  )}
                </span>
              </div>
            </div>
          );
        },
      },
      {
        id: 'spec',
        accessorFn: (item) => specSummary(item.spec),
        header: 'Spec',
        enableSorting: false,
        cell: ({ getValue }) => <span className="text-scree-800">{getValue<string>()}</span>,
      },
      {
        id: 'countOwned',
        accessorFn: (item) => item.countOwned,
        header: 'Owned',
        sortDescFirst: true,
        cell: ({ getValue }) => formatNumber(getValue<number>()),
        meta: { numeric: true },
      },
      {
        id: 'massG',
        accessorFn: (item) => item.massG,
        header: 'Each',
        sortDescFirst: true,
        cell: ({ getValue }) => formatGrams(getValue<number>()),
        meta: { numeric: true },
      },
      {
        id: 'totalG',
        accessorFn: (item) => item.massG * item.countOwned,
        header: 'All owned',
        sortDescFirst: true,
        cell: ({ getValue }) => formatGrams(getValue<number>()),
        meta: { numeric: true },
      },
      {
        id: 'kind',
        accessorFn: (item) => item.kind,
        filterFn: 'equals',
        enableSorting: false,
      },
      {
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        enableSorting: false,
        cell: ({ row: { original: item } }) => (
          <div className="flex justify-end gap-1">
            <Button variant="quiet" size="sm" onClick={() => onEdit(item)} aria-label={`Edit ${item.name}`}>
              Edit
            </Button>
            <Button variant="quiet" size="sm" onClick={() => onDelete(item)} aria-label={`Delete ${item.name}`}>
              Delete
            </Button>
          </div>
        ),
      },
    ],
    [onEdit, onDelete],
  );

  const columnFilters = useMemo(() => (kind === 'all' ? [] : [{ id: 'kind', value: kind }]), [kind]);
  const table = useReactTable({
    data: items as LockerItem[],
    columns,
    state: { sorting, globalFilter: search, columnFilters, columnVisibility: { kind: false } },
    onSortingChange: setSorting,
    globalFilterFn: matchesSearch,
    getColumnCanGlobalFilter: (column) => column.id === 'name',
    getCoreRowModel: getCoreRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (item) => item.id,
  });

  const rows = table.getRowModel().rows;
  const groups = groupByPowerRole(rows.map((row) => ({ kind: row.original.kind, row })));
  const columnCount = table.getVisibleLeafColumns().length;

  if (rows.length === 0)
    return (
      <p role="status" className="rounded-xl border-2 border-scree-200 bg-white px-4 py-8 text-center text-scree-700">
        No items match{search.trim() ? ` “${search.trim()}”` : ''}
        {kind !== 'all' ? ` among the ${kindPluralLabels[kind].toLowerCase()}` : ''}.
      </p>
    );

  return (
    <div
      tabIndex={0}
      role="region"
      aria-label="Locker table"
      className="relative overflow-x-auto rounded-xl border-2 border-scree-200 bg-white shadow-card focus-visible:outline-2 focus-visible:outline-tarn-600"
    >
      <table className="w-full min-w-[46rem] border-collapse text-left text-sm">
        <caption className="sr-only">
          Locker items grouped by what they do, with their grams. Column headers sort the rows within each group.
        </caption>
        <thead className="bg-firn-100 text-scree-700">
          {table.getHeaderGroups().map((headerGroup) => (
            <tr key={headerGroup.id}>
              {headerGroup.headers.map((header) => {
                const numeric = (header.column.columnDef.meta as { numeric?: boolean } | undefined)?.numeric;
                const sorted = header.column.getIsSorted();
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={header.column.getCanSort() ? ariaSort(sorted) : undefined}
                    className={cn(
                      'px-4 py-3 font-semibold',
                      numeric && 'text-right',
                      header.column.id === 'name' && 'sticky left-0 z-10 bg-firn-100',
                    )}
                  >
                    {header.column.getCanSort() ? (
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className={cn(
                          'inline-flex items-center gap-1.5 rounded hover:text-scree-950',
                          numeric && 'flex-row-reverse',
                        )}
                      >
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <SortIcon sorted={sorted} />
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
        {groups.map((group) => {
          const groupItems = group.items.map(({ row }) => row.original);
          const counted = countsTowardGrams(groupItems[0]!.kind);
          const headingId = `locker-group-${group.role}`;
          return (
            <tbody key={group.role} aria-labelledby={headingId} className="border-t-2 border-scree-200">
              <tr className="bg-white">
                <th id={headingId} scope="colgroup" colSpan={columnCount} className="px-4 pt-5 pb-2 text-left">
                  <span className="sticky left-4 flex flex-wrap items-baseline gap-x-3 gap-y-0.5">
                    <span className="text-base font-semibold text-scree-950">{group.label}</span>
                    <span className="text-sm font-normal text-scree-600">
                      {group.items.length === 1 ? '1 item' : `${group.items.length} items`}
                      {' · '}
                      {counted
                        ? formatGrams(totalGramsOf(groupItems))
                        : `${formatGrams(groupItems.reduce((sum, item) => sum + item.massG * item.countOwned, 0))}, not in the total`}
                    </span>
                  </span>
                </th>
              </tr>
              {group.items.map(({ row }) => (
                <tr key={row.id} className="group border-t border-firn-200 hover:bg-firn-50">
                  {row.getVisibleCells().map((cell) => {
                    const numeric = (cell.column.columnDef.meta as { numeric?: boolean } | undefined)?.numeric;
                    const isName = cell.column.id === 'name';
                    const content = flexRender(cell.column.columnDef.cell, cell.getContext());
                    return isName ? (
                      <th
                        key={cell.id}
                        scope="row"
                        className="sticky left-0 z-10 bg-white px-4 py-2.5 font-normal shadow-[1px_0_0_#dde4e2] group-hover:bg-firn-50"
                      >
                        {content}
                      </th>
                    ) : (
                      <td
                        key={cell.id}
                        className={cn(
                          'px-4 py-2.5',
                          numeric && 'text-right whitespace-nowrap tabular-nums',
                          cell.column.id === 'spec' && 'min-w-52',
                        )}
                      >
                        {content}
                      </td>
                    );
                  })}
                </tr>
              ))}
            </tbody>
          );
        })}
      </table>
    </div>
  );
}
