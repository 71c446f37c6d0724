import { createColumnHelper } from '@tanstack/react-table';
import type { StandbyEntry } from '@shared/schemas/standby.schemas';
import { Button } from '@client/components/ui/button';
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
      cell: ({ row }) => (
        <Button
          variant="quiet"
          busy={removing === row.original.id}
          onClick={() => onRemove(row.original)}
          aria-label={`Remove ${row.original.client.name} from the standby list`}
        >
          Remove
        </Button>
      ),
    }),
  ];
}
