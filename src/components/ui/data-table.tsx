import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from '@tanstack/react-table';
import { useId, useState } from 'react';
import { Button } from './button';

type Props<T> = {
  /** Names the table region and the filter box, e.g. "Services". */
  label: string;
  rows: T[];
  // TanStack's column type is invariant in the value type; columns of mixed value types need `any` here.
  columns: ColumnDef<T, any>[]; // eslint-disable-line @typescript-eslint/no-explicit-any
  filterHint: string;
  initialSort?: SortingState;
  pageSize?: number;
  empty: string;
};

const sortWords = { asc: 'ascending', desc: 'descending' } as const;

/** A table with a text filter, sortable column headers and pages (TanStack Table). */
export function DataTable<T>({ label, rows, columns, filterHint, initialSort = [], pageSize = 10, empty }: Props<T>) {
  const [sorting, setSorting] = useState<SortingState>(initialSort);
  const [filter, setFilter] = useState('');
  const [pagination, setPagination] = useState({ pageIndex: 0, pageSize });
  const filterId = useId();
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting, globalFilter: filter, pagination },
    onSortingChange: setSorting,
    onGlobalFilterChange: (value: string) => {
      setFilter(value);
      setPagination((p) => ({ ...p, pageIndex: 0 }));
    },
    onPaginationChange: setPagination,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
  });
  const shown = table.getFilteredRowModel().rows.length;
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-col gap-1 sm:max-w-sm">
        <label htmlFor={filterId} className="font-bold">
          Filter {label.toLowerCase()}
        </label>
        <input id={filterId} type="search" value={filter} onChange={(e) => table.setGlobalFilter(e.target.value)} placeholder={filterHint} className="min-h-11 rounded-lg border border-ink/40 bg-white px-3" />
      </div>
      <p aria-live="polite" className="text-sm text-ink/80">
        {shown} of {rows.length} shown
      </p>
      <div role="region" aria-label={label} tabIndex={0} className="relative overflow-x-auto rounded-xl ring-1 ring-ink/10">
        <table className="w-full min-w-[40rem] border-collapse bg-white text-left">
          <thead className="bg-linen">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th key={header.id} scope="col" aria-sort={sorted ? sortWords[sorted] : undefined} className="px-3 py-2 align-bottom">
                      {header.column.getCanSort() ? (
                        <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex min-h-11 items-center gap-1 font-bold">
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden="true">{sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}</span>
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
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-t border-ink/10 align-top">
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
      {rows.length === 0 && <p>{empty}</p>}
      {table.getPageCount() > 1 && (
        <nav aria-label={`Pages of ${label.toLowerCase()}`} className="flex items-center gap-3">
          <Button variant="secondary" disabled={!table.getCanPreviousPage()} onClick={() => table.previousPage()}>
            Previous page
          </Button>
          <span className="tabular">
            Page {pagination.pageIndex + 1} of {table.getPageCount()}
          </span>
          <Button variant="secondary" disabled={!table.getCanNextPage()} onClick={() => table.nextPage()}>
            Next page
          </Button>
        </nav>
      )}
    </div>
  );
}
