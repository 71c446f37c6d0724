import type { ReactNode } from 'react';
import type { BookingView } from '@shared/schemas/booking-view.schemas';
import { BookingStatusBadge } from '@client/components/ui/booking-status-badge';
import { SkinTestFlag } from '@client/components/ui/skin-test-flag';
import { DepositBadge } from '@client/components/ui/deposit-badge';
import { sittingLabel } from '@client/lib/booking-labels';
import { formatDate, formatRange } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { formatMoney } from '@shared/money/money';

/** `children`: what may be done with the booking (e.g. the client's move and cancel), under its details. */
type Props = { booking: BookingView; timeZone: string; currency: string; headingLevel?: 'h3' | 'h4'; children?: ReactNode };

/** One booking with each of its sittings' day, times and chair. */
export function BookingCard({ booking, timeZone, currency, headingLevel: Heading = 'h3', children }: Props) {
  return (
    <article className="rounded-xl bg-white p-4 ring-1 ring-ink/15">
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <Heading className="text-lg font-bold">{booking.service.name}</Heading>
          <p className="text-ink/80">
            with {booking.stylist.name} · for {booking.client.name}
          </p>
        </div>
        <BookingStatusBadge status={booking.status} />
        <SkinTestFlag skinTest={booking.skinTest} detailed />
      </div>
      <ul className="mt-3 flex flex-col gap-2">
        {booking.sittings.map((sitting) => (
          <li key={sitting.seq} className="rounded-lg bg-linen px-3 py-2">
            {sitting.of > 1 && <span className="mr-2 font-bold">{sittingLabel(sitting.seq, sitting.of)}:</span>}
            <span>{formatDate(sitting.start, formatFor(timeZone), { width: 'short' })}</span>
            <span className="mx-1" aria-hidden="true">
              ·
            </span>
            <span className="tabular">{formatRange(sitting.start, sitting.end, formatFor(timeZone))}</span>
            <span className="mx-1" aria-hidden="true">
              ·
            </span>
            <span>{sitting.chairName}</span>
          </li>
        ))}
      </ul>
      <p className="mt-3 text-sm tabular">
        Price {formatMoney(booking.priceCents, currency)}
        {booking.depositCents > 0 && ` · deposit ${formatMoney(booking.depositCents, currency)}`}
        {booking.depositCents > 0 && booking.depositOutcome && (booking.depositOutcome === 'kept' ? ', kept by the salon' : ', refunded')}{' '}
        {!booking.depositOutcome && <DepositBadge deposit={booking.deposit} currency={currency} />}
      </p>
      {children}
    </article>
  );
}
