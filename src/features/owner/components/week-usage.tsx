import type { OwnerOverview } from '@shared/schemas/owner.schemas';
import { SectionCard } from '@client/components/ui/section-card';
import { formatPercent } from '@client/lib/booking-labels';
import { formatDate } from '@shared/format/date-time';
import { zonelessFormat } from '@shared/format/locale';
import { shiftLocalDate } from '@shared/time/salon-time';
import { StatTile } from './stat-tile';

type Props = { week: OwnerOverview['week'] };

/** How this week's chairs and hands-free windows are used. */
export function WeekUsage({ week }: Props) {
  return (
    <SectionCard title="This week">
      <p className="mb-3 text-ink/80">
        {/* `to` is the exclusive end: the week ends the day before it. */}
        {formatDate(week.from, zonelessFormat)} to {formatDate(shiftLocalDate(week.to, -1), zonelessFormat)}
      </p>
      <dl className="grid gap-3 sm:grid-cols-3">
        <StatTile label="Bookings" value={String(week.bookings)} />
        <StatTile label="Chair occupancy" value={formatPercent(week.chairOccupancy)} note="chair minutes with a client ÷ open minutes" />
        <StatTile label="Window use" value={formatPercent(week.windowUse)} note="hands-free minutes given to other clients" />
      </dl>
    </SectionCard>
  );
}
