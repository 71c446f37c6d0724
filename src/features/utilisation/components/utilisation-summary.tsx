import { formatDuration } from '@shared/format/date-time';
import type { DeskUtilisation, OwnerUtilisation } from '@shared/schemas/utilisation.schemas';
import { SectionCard } from '@client/components/ui/section-card';
import { StatTile } from '@client/features/owner';
import { percentText } from './chart-labels';
import { formatMoney } from '@shared/money/money';

type Props = { report: DeskUtilisation | OwnerUtilisation; currency?: string };

const isOwner = (r: DeskUtilisation | OwnerUtilisation): r is OwnerUtilisation => 'money' in r;
const minutesOrDash = (m: number | null) => (m === null ? '—' : formatDuration(Math.round(m)));

/** The period's headline figures: the engine's occupancy and window use, attendance, and for the owner money and corrections. */
export function UtilisationSummary({ report, currency }: Props) {
  const a = report.attendance;
  return (
    <div className="flex flex-col gap-6">
      <SectionCard title="At a glance">
        <dl className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
          <StatTile label="Chair occupancy" value={percentText(report.chairOccupancy)} note="chair minutes with a client ÷ open chair minutes" />
          <StatTile label="Window use" value={percentText(report.windowUse)} note="hands-free minutes given to other clients" />
          <StatTile label="No-show rate" value={percentText(a.noShowRate)} note={`${a.noShows} of ${a.bookings - a.cancelled} bookings kept in the book`} />
          <StatTile label="Late cancellations" value={percentText(a.lateCancelRate)} note={`${a.lateCancels} of ${a.bookings} bookings`} />
        </dl>
      </SectionCard>
      {isOwner(report) && currency && (
        <SectionCard title="Money">
          <dl className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
            <StatTile label="Revenue" value={formatMoney(report.money.revenueCents, currency)} note="prices of kept bookings, shared over their sittings" />
            <StatTile
              label="Revenue per chair-hour"
              value={report.money.revenuePerChairHourCents === null ? '—' : formatMoney(report.money.revenuePerChairHourCents, currency)}
              note={`${Math.round(report.money.chairHours)} open chair-hours`}
            />
            <StatTile
              label="Revenue per stylist hour"
              value={report.money.revenuePerStylistHourCents === null ? '—' : formatMoney(report.money.revenuePerStylistHourCents, currency)}
              note={`${Math.round(report.money.stylistHours)} hours on the clock`}
            />
            <StatTile label="Deposits taken" value={formatMoney(report.deposits.takenCents, currency)} note={`${report.deposits.taken} bookings`} />
            <StatTile
              label="Deposits kept"
              value={formatMoney(report.deposits.keptCents, currency)}
              note={`${report.deposits.kept} no-shows and late cancellations`}
            />
            <StatTile
              label="Deposits refunded"
              value={formatMoney(report.deposits.refundedCents, currency)}
              note={`${report.deposits.refunded} cancelled in good time`}
            />
            <StatTile label="Corrections" value={String(report.corrections.count)} note="colour bookings of 4 h or more, or several sittings" />
            <StatTile
              label="Correction length, booked vs quoted"
              value={minutesOrDash(report.corrections.averageBookedMinutes)}
              note={`quoted ${minutesOrDash(report.corrections.averageQuotedMinMinutes)} to ${minutesOrDash(report.corrections.averageQuotedMaxMinutes)} on average`}
            />
          </dl>
        </SectionCard>
      )}
    </div>
  );
}
