import { flexRender, getCoreRowModel, getFilteredRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { useId, useMemo, useState } from 'react';
import type { StandbyEntry } from '../../../../shared/schemas/standby.schemas';
import { FormAlert } from '../../../components/ui/form-alert';
import { useRemoveStandby } from '../api/standby-mutations';
import { standbyColumns } from './standby-columns';

type Props = { entries: StandbyEntry[]; timeZone: string };

const sortWords = { asc: 'ascending', desc: 'descending' } as const;

/** The standby list as a table: filter by any text, sort by a column header. */
export function StandbyTable({ entries, timeZone }: Props) {
  const remove = useRemoveStandby();
  const [sorting, setSorting] = useState<SortingState>([{ id: 'createdAt', desc: false }]);
  const [filter, setFilter] = useState('');
  const filterId = useId();
  const columns = useMemo(
    () => standbyColumns(timeZone, (entry) => remove.mutate(entry.id), remove.isPending ? (remove.variables ?? null) : null),
    [timeZone, remove],
  );
  const table = useReactTable({
    data: entries,
    columns,
    state: { sorting, globalFilter: filter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  const rows = table.getRowModel().rows;
  return (
    <div className="flex flex-col gap-3">
      {remove.isError && <FormAlert>{remove.error.message}</FormAlert>}
      <div className="flex flex-col gap-1 sm:max-w-sm">
        <label htmlFor={filterId} className="font-bold">
          Filter
        </label>
        <input id={filterId} type="search" value={filter} onChange={(e) => setFilter(e.target.value)} placeholder="Name, service, stylist, day…" className="min-h-11 rounded-lg border border-ink/40 bg-white px-3" />
      </div>
      <p aria-live="polite" className="text-sm text-ink/80">
        {rows.length} of {entries.length} {entries.length === 1 ? 'entry' : 'entries'}
      </p>
      <div role="region" aria-label="Standby entries" tabIndex={0} className="relative overflow-x-auto rounded-xl ring-1 ring-ink/10">
        <table className="w-full min-w-[48rem] border-collapse bg-white text-left">
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
            {rows.map((row) => (
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
      {entries.length === 0 && <p>Nobody is on the standby list yet.</p>}
    </div>
  );
}
