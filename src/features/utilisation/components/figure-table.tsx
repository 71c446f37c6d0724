import { getCoreRowModel, getSortedRowModel, useReactTable, type ColumnDef, type SortingState } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Button } from '@client/components/ui/button';
import { TableGrid } from '@client/components/ui/table-grid';
import { downloadCsv, toCsv, type CsvCell } from '@client/lib/csv';

export interface FigureColumn<T> {
  id: string;
  header: string;
  /** The raw value: what sorting and the CSV use. */
  value: (row: T) => CsvCell;
  /** How the cell reads on screen; the raw value when left out. */
  format?: (row: T) => string;
  numeric?: boolean;
  /** What the CSV's numbers are in, written after its header: "Hands-on share (%)", "Revenue (USD)". */
  unit?: string;
}

type Props<T> = { caption: string; columns: FigureColumn<T>[]; rows: T[]; filename: string };

/** A chart's numbers as a sortable table, with its CSV download. */
export function FigureTable<T>({ caption, columns, rows, filename }: Props<T>) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const defs = useMemo<ColumnDef<T>[]>(
    () =>
      columns.map((c) => ({
        id: c.id,
        header: c.header,
        accessorFn: (row: T) => c.value(row),
        cell: ({ row }) => (c.format ? c.format(row.original) : String(c.value(row.original) ?? '—')),
        sortUndefined: 'last',
      })),
    [columns],
  );
  const table = useReactTable({
    data: rows,
    columns: defs,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });
  const download = () =>
    downloadCsv(
      filename,
      toCsv(
        columns.map((c) => (c.unit ? `${c.header} (${c.unit})` : c.header)),
        table.getRowModel().rows.map((r) => columns.map((c) => c.value(r.original))),
      ),
    );
  return (
    <div className="flex flex-col gap-2">
      <TableGrid table={table} label={caption} caption={caption} numeric={(i) => Boolean(columns[i]?.numeric)} />
      {rows.length === 0 && <p>Nothing to show for this period.</p>}
      <div className="print:hidden">
        <Button type="button" variant="secondary" onClick={download}>
          Download CSV: {caption}
        </Button>
      </div>
    </div>
  );
}
