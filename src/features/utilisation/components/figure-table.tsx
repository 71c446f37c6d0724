import { flexRender, getCoreRowModel, getSortedRowModel, useReactTable, type ColumnDef, type SortingState } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { downloadCsv, toCsv, type CsvCell } from '../csv';

export interface FigureColumn<T> {
  id: string;
  header: string;
  /** The raw value: what sorting and the CSV use. */
  value: (row: T) => CsvCell;
  /** How the cell reads on screen; the raw value when left out. */
  format?: (row: T) => string;
  numeric?: boolean;
}

type Props<T> = { caption: string; columns: FigureColumn<T>[]; rows: T[]; filename: string };

const sortWords = { asc: 'ascending', desc: 'descending' } as const;

/** A chart's numbers as a sortable table, with its CSV download. */
export function FigureTable<T>({ caption, columns, rows, filename }: Props<T>) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const defs = useMemo<ColumnDef<T>[]>(
    () => columns.map((c) => ({ id: c.id, header: c.header, accessorFn: (row: T) => c.value(row), cell: ({ row }) => (c.format ? c.format(row.original) : String(c.value(row.original) ?? '—')), sortUndefined: 'last' })),
    [columns],
  );
  const table = useReactTable({ data: rows, columns: defs, state: { sorting }, onSortingChange: setSorting, getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel() });
  const download = () => downloadCsv(filename, toCsv(columns.map((c) => c.header), table.getRowModel().rows.map((r) => columns.map((c) => c.value(r.original)))));
  return (
    <div className="flex flex-col gap-2">
      <div role="region" aria-label={caption} tabIndex={0} className="overflow-x-auto rounded-xl ring-1 ring-ink/10">
        <table className="w-full border-collapse bg-white text-left">
          <caption className="px-3 py-2 text-left text-sm text-ink/80">{caption}</caption>
          <thead className="bg-linen">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header, i) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th key={header.id} scope="col" aria-sort={sorted ? sortWords[sorted] : undefined} className={`px-3 py-1 ${columns[i].numeric ? 'text-right' : ''}`}>
                      <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex min-h-11 items-center gap-1 font-bold print:min-h-0">
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <span aria-hidden="true" className="print:hidden">{sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}</span>
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-t border-ink/10">
                {row.getVisibleCells().map((cell, i) => (
                  <td key={cell.id} className={`px-3 py-1.5 ${columns[i].numeric ? 'text-right tabular' : ''}`}>
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {rows.length === 0 && <p>Nothing to show for this period.</p>}
      <div className="print:hidden">
        <Button type="button" variant="secondary" onClick={download}>
          Download CSV: {caption}
        </Button>
      </div>
    </div>
  );
}
