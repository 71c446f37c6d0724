import { createColumnHelper } from '@tanstack/react-table';
import type { StaffMember } from '@shared/schemas/setup.schemas';
import { Button } from '@client/components/ui/button';
import { DataTable } from '@client/components/ui/data-table';
import { roleLabels } from '@client/lib/role-labels';

const col = createColumnHelper<StaffMember>();

const columns = (onPick: (m: StaffMember) => void) => [
  col.accessor((m) => m.details.name, { id: 'name', header: 'Name' }),
  col.accessor('email', { header: 'E-mail' }),
  col.accessor((m) => roleLabels[m.details.role], { id: 'role', header: 'Role' }),
  col.accessor((m) => m.details.skills.join(', '), { id: 'skills', header: 'Skills' }),
  col.accessor((m) => (m.staffId ? m.details.maxClientsAtOnce : null), { id: 'cap', header: 'Clients at once', cell: (c) => c.getValue() ?? '—' }),
  col.accessor('futureBookings', { header: 'Future bookings' }),
  col.accessor((m) => (!m.active ? 'deactivated' : m.invited ? 'invited' : 'active'), { id: 'status', header: 'Status' }),
  col.display({
    id: 'open',
    header: () => <span className="sr-only">Change</span>,
    cell: (c) => (
      <Button variant="secondary" aria-label={`Change ${c.row.original.details.name}`} onClick={() => onPick(c.row.original)}>
        Change
      </Button>
    ),
  }),
];

export function StaffTable({ staff, onPick }: { staff: StaffMember[]; onPick: (m: StaffMember) => void }) {
  return (
    <DataTable
      label="Staff"
      rows={staff}
      columns={columns(onPick)}
      filterHint="Name, e-mail, role, skill…"
      initialSort={[{ id: 'name', desc: false }]}
      empty="Nobody yet."
    />
  );
}
