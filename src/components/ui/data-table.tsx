import {
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
import { TableGrid } from './table-grid';

type Props<T> = {
  /** Names the table region and the filter box, e.g. "Services". */
  label: string;
  rows: T[];
  // TanStack's column type is invariant in the value type; columns of mixed value types need `any` here.
  columns: ColumnDef<T, any>[]; // eslint-disable-line @typescript-eslint/no-explicit-any -- columns hold values of different types, as TanStack types them
  filterHint: string;
  initialSort?: SortingState;
  pageSize?: number;
  empty: string;
};

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
        <input
          id={filterId}
          type="search"
          value={filter}
          onChange={(e) => table.setGlobalFilter(e.target.value)}
          placeholder={filterHint}
          className="min-h-11 rounded-lg border border-edge bg-white px-3"
        />
      </div>
      <p aria-live="polite" className="text-sm text-ink/80">
        {shown} of {rows.length} shown
      </p>
      <TableGrid table={table} label={label} minWidth />
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
