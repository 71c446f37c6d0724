import { Link } from 'react-router-dom';
import type { BookingView } from '@shared/schemas/booking-view.schemas';
import { BookingStatusBadge } from '@client/components/ui/booking-status-badge';
import { SkinTestFlag } from '@client/components/ui/skin-test-flag';
import { DepositBadge } from '@client/components/ui/deposit-badge';
import { SectionCard } from '@client/components/ui/section-card';
import { SittingStatusBadge } from '@client/components/ui/sitting-status-badge';
import { StepStrip } from '@client/components/ui/step-strip';
import { paths } from '@client/config/paths';
import { sittingLabel } from '@client/lib/booking-labels';
import { StepTimes } from './step-times';
import { formatDate, formatRange, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { formatMoney } from '@shared/money/money';

type Props = { booking: BookingView; timeZone: string; currency: string };

/** Who, what, with whom, the status, money, and every sitting with its steps. */
export function BookingSummary({ booking, timeZone, currency }: Props) {
  return (
    <SectionCard title="Booking">
      <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-[max-content_1fr]">
        <dt className="font-bold">Client</dt>
        <dd>
          <Link to={paths.deskClient(booking.client.id)} className="text-link">
            {booking.client.name}
          </Link>
        </dd>
        <dt className="font-bold">Service</dt>
        <dd>{booking.service.name}</dd>
        <dt className="font-bold">Stylist</dt>
        <dd>{booking.stylist.name}</dd>
        <dt className="font-bold">Status</dt>
        <dd>
          <BookingStatusBadge status={booking.status} />
          <SkinTestFlag skinTest={booking.skinTest} detailed />
        </dd>
        <dt className="font-bold">Price</dt>
        <dd className="tabular">{formatMoney(booking.priceCents, currency)}</dd>
        <dt className="font-bold">Deposit</dt>
        <dd className="tabular">
          {booking.depositCents > 0 ? formatMoney(booking.depositCents, currency) : 'None'}
          {booking.depositOutcome && ` · ${booking.depositOutcome === 'kept' ? 'kept by the salon' : 'refunded to the client'}`}{' '}
          <DepositBadge deposit={booking.deposit} currency={currency} />
        </dd>
        {booking.cancelReason && (
          <>
            <dt className="font-bold">Cancelled because</dt>
            <dd>{booking.cancelReason}</dd>
          </>
        )}
      </dl>
      <ol className="mt-4 flex flex-col gap-4">
        {booking.sittings.map((sitting) => (
          <li key={sitting.seq} className="flex flex-col gap-2 rounded-lg bg-linen p-3">
            <h3 className="font-bold">
              {sittingLabel(sitting.seq, sitting.of) ?? 'Sitting'}: {formatDate(sitting.start, formatFor(timeZone), { width: 'short' })},{' '}
              <span className="tabular">{formatRange(sitting.start, sitting.end, formatFor(timeZone))}</span> · {sitting.chairName}
            </h3>
            <StepStrip steps={sitting.steps} timeZone={timeZone} />
            {sitting.status !== 'booked' && (
              <p>
                <SittingStatusBadge status={sitting.status} lateMinutes={sitting.lateMinutes} />
                {sitting.arrivedAt && <span className="tabular text-sm"> Arrived {formatTime(sitting.arrivedAt, formatFor(timeZone))}</span>}
              </p>
            )}
            <StepTimes steps={sitting.steps} timeZone={timeZone} />
          </li>
        ))}
      </ol>
    </SectionCard>
  );
}
