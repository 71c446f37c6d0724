import { formatDuration } from '@shared/format/date-time';
import { createColumnHelper } from '@tanstack/react-table';
import { Link } from 'react-router-dom';
import { sittingMaxMinutes, type ProductFamily } from '@shared/schemas/step-plan.schemas';
import { planNeedsSkinTest } from '@shared/rules/skin-test-need';
import type { SetupService } from '@shared/schemas/setup.schemas';
import { DataTable } from '@client/components/ui/data-table';
import { paths } from '@client/config/paths';
import { formatMoney } from '@shared/money/money';

const col = createColumnHelper<SetupService>();

const columns = (currency: string, families: readonly ProductFamily[]) => [
  col.accessor('name', {
    header: 'Service',
    cell: (c) => (
      <Link to={paths.ownerSetupService(c.row.original.id)} className="font-bold text-link">
        {c.getValue()}
      </Link>
    ),
  }),
  col.accessor('category', { header: 'Kind' }),
  col.accessor('skill', { header: 'Skill needed' }),
  col.accessor((s) => sittingMaxMinutes(s.stepPlan).reduce((a, b) => a + b, 0), {
    id: 'chairTime',
    header: 'Chair time (most)',
    cell: (c) => `${c.row.original.stepPlan.sittings.length > 1 ? `${c.row.original.stepPlan.sittings.length} sittings, ` : ''}${formatDuration(c.getValue())}`,
  }),
  col.accessor('priceCents', { header: 'Price', cell: (c) => `${c.row.original.priceIsFrom ? 'from ' : ''}${formatMoney(c.getValue(), currency)}` }),
  col.accessor('depositCents', {
    header: 'Deposit',
    cell: (c) =>
      c.row.original.depositPercent !== null
        ? `${c.row.original.depositPercent} % (${formatMoney(c.getValue(), currency)})`
        : c.getValue()
          ? formatMoney(c.getValue(), currency)
          : 'none',
  }),
  // The skin-test need follows the steps (and the service's own box, which only adds), as at every booking door.
  col.accessor(
    (s) => [s.onlineBookable ? 'online' : '', planNeedsSkinTest(s.stepPlan, families, s.needsSkinTest) ? 'skin test' : ''].filter(Boolean).join(', '),
    { id: 'flags', header: 'Online · skin test' },
  ),
  col.accessor('futureBookings', { header: 'Future bookings' }),
  col.accessor((s) => (s.active ? 'on the menu' : 'retired'), { id: 'status', header: 'Status' }),
];

export function ServicesTable({ services, currency, families }: { services: SetupService[]; currency: string; families: readonly ProductFamily[] }) {
  return (
    <DataTable
      label="Services"
      rows={services}
      columns={columns(currency, families)}
      filterHint="Name, kind, skill…"
      initialSort={[{ id: 'name', desc: false }]}
      empty="No services yet."
    />
  );
}
