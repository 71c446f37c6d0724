import { createColumnHelper } from '@tanstack/react-table';
import type { StandbyEntry } from '@shared/schemas/standby.schemas';
import { Link } from 'react-router-dom';
import { buttonClasses } from '@client/components/ui/button';
import { ConfirmRemove } from '@client/components/ui/confirm-remove';
import { paths } from '@client/config/paths';
import { formatDate } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { availabilityText } from '../weekdays';

const column = createColumnHelper<StandbyEntry>();

/** The standby table's columns; the text of each is what sorting and the filter use. */
export function standbyColumns(timeZone: string, phoneText: (stored: string) => string, onRemove: (entry: StandbyEntry) => void, removing: string | null) {
  return [
    column.accessor((e) => e.client.name, {
      id: 'client',
      header: 'Client',
      cell: ({ row }) => (
        <>
          <span className="font-bold">{row.original.client.name}</span>
          <span className="block text-sm text-ink/80">
            {[row.original.client.phone && phoneText(row.original.client.phone), row.original.client.email].filter(Boolean).join(' · ')}
          </span>
        </>
      ),
    }),
    column.accessor((e) => e.services.map((s) => s.name).join(', '), { id: 'services', header: 'Services wanted' }),
    column.accessor((e) => e.stylist?.name ?? 'Any', { id: 'stylist', header: 'Stylist' }),
    column.accessor((e) => e.availability.map(availabilityText).join('; '), {
      id: 'availability',
      header: 'Can come',
      cell: (c) => <span className="tabular">{c.getValue()}</span>,
    }),
    column.accessor('notes', { header: 'Notes', enableSorting: false }),
    column.accessor('createdAt', {
      header: 'Added',
      cell: (c) => <span className="tabular">{formatDate(c.getValue(), formatFor(timeZone), { width: 'short' })}</span>,
      enableGlobalFilter: false,
    }),
    column.display({
      id: 'remove',
      header: () => <span className="sr-only">Actions</span>,
      cell: ({ row }) => {
        const { client, services, stylist } = row.original;
        const start = { client: client.id, service: services[0]?.id, stylist: stylist?.id };
        return (
          <div className="flex flex-wrap items-center gap-2">
            <Link to={paths.deskBook(undefined, start)} className={buttonClasses('secondary')} aria-label={`Book ${client.name}`}>
              Book
            </Link>
            <ConfirmRemove what={`${client.name} from the standby list`} busy={removing === row.original.id} onRemove={() => onRemove(row.original)} />
          </div>
        );
      },
    }),
  ];
}
