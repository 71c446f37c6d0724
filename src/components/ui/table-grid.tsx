import { flexRender, type Table } from '@tanstack/react-table';

type Props<T> = {
  table: Table<T>;
  /** Names the scrollable region for screen readers. */
  label: string;
  caption?: string;
  /** Columns whose figures line up on the right (by column index). */
  numeric?: (index: number) => boolean;
  minWidth?: boolean;
};

const sortWords = { asc: 'ascending', desc: 'descending' } as const;

/** The markup of every TanStack table in Dwell: a scrollable region, sortable header buttons, rows. */
export function TableGrid<T>({ table, label, caption, numeric = () => false, minWidth = false }: Props<T>) {
  return (
    <div role="region" aria-label={label} tabIndex={0} className="relative overflow-x-auto rounded-xl ring-1 ring-ink/10">
      <table className={`w-full border-collapse bg-white text-left ${minWidth ? 'min-w-[40rem]' : ''}`}>
        {caption && <caption className="px-3 py-2 text-left text-sm text-ink/80">{caption}</caption>}
        <thead className="bg-linen">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header, i) => {
                const sorted = header.column.getIsSorted();
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sorted ? sortWords[sorted] : undefined}
                    className={`px-3 py-2 align-bottom ${numeric(i) ? 'text-right' : ''}`}
                  >
                    {header.column.getCanSort() ? (
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className="inline-flex min-h-11 items-center gap-1 font-bold print:min-h-0"
                      >
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <span aria-hidden="true" className="print:hidden">
                          {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
                        </span>
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
              {row.getVisibleCells().map((cell, i) => (
                <td key={cell.id} className={`px-3 py-2 ${numeric(i) ? 'text-right tabular' : ''}`}>
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
