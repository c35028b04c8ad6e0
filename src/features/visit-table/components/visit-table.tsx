import { flexRender, getCoreRowModel, useReactTable, type SortingState, type Updater } from '@tanstack/react-table';
import { useMemo } from 'react';
import { VISIT_TABLE_SORTS, type VisitTableRow, type VisitTableSort } from '@shared/schemas/visit-table';
import { cn } from '@/lib/cn';
import { visitColumns, type ColumnLinks } from './visit-columns';

interface VisitTableProps extends ColumnLinks {
  rows: VisitTableRow[];
  sort: VisitTableSort;
  dir: 'asc' | 'desc';
  onSort: (sort: VisitTableSort, dir: 'asc' | 'desc') => void;
  busy: boolean;
}

const isSortKey = (id: string): id is VisitTableSort => (VISIT_TABLE_SORTS as readonly string[]).includes(id);

/** The rows of one page. Sorting happens on the server: a header click asks for a new page, it never reorders locally. */
export function VisitTable({ rows, sort, dir, onSort, busy, recordHref, pressHistoryHref }: VisitTableProps) {
  const columns = useMemo(() => visitColumns({ recordHref, pressHistoryHref }), [recordHref, pressHistoryHref]);
  const sorting: SortingState = [{ id: sort, desc: dir === 'desc' }];
  // TanStack Table v8 hands back a new table object each render by design; nothing here relies on memoizing it.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting },
    manualSorting: true,
    manualPagination: true,
    enableSortingRemoval: false,
    enableMultiSort: false,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (row) => String(row.id),
    onSortingChange: (updater: Updater<SortingState>) => {
      const next = (typeof updater === 'function' ? updater(sorting) : updater)[0];
      if (next && isSortKey(next.id)) onSort(next.id, next.desc ? 'desc' : 'asc');
    },
  });

  return (
    <div className="overflow-x-auto rounded-xl border border-surface-line bg-surface-raised" aria-busy={busy}>
      <table className={cn('w-full min-w-[70rem] text-left text-lg', busy && 'opacity-60')}>
        <caption className="sr-only">All visits, sorted by {sort} {dir === 'asc' ? 'ascending' : 'descending'}. Column headers sort the table.</caption>
        <thead className="border-b-2 border-surface-line bg-surface-sunken text-base">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                const label = flexRender(header.column.columnDef.header, header.getContext());
                return (
                  <th key={header.id} scope="col" className="px-3 py-1 font-semibold text-ink" aria-sort={sorted ? (sorted === 'asc' ? 'ascending' : 'descending') : undefined}>
                    {header.column.getCanSort() ? (
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className="flex min-h-touch items-center gap-1 rounded-md px-1 hover:text-accent focus-visible:outline-none focus-visible:ring-[3px] focus-visible:ring-accent"
                      >
                        {label}
                        <span aria-hidden="true" className="w-4 text-accent">
                          {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
                        </span>
                      </button>
                    ) : (
                      label
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-surface-line align-top even:bg-surface">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-3 py-2">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
