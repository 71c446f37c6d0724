import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { skinTestWords } from '@shared/rules/skin-test-words';
import { urlOf } from '@shared/api/endpoint';
import { onlineBookingApi } from '@shared/api/online-booking.api';
import type { BookingView } from '@shared/schemas/booking-view.schemas';
import type { Salon } from '@shared/schemas/salon.schemas';
import { buttonClasses } from '@client/components/ui/button';
import { paths } from '@client/config/paths';
import { formatDate, formatRange, formatZone } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { telHref } from '@shared/format/dial';
import { formatPhone } from '@shared/format/phone';
import { onlineBookingQueries } from '../api/online-booking-queries';
import { confirmationWords } from '../confirmation-words';
import { formatMoney } from '@shared/money/money';

type Props = { booking: BookingView; salon: Pick<Salon, 'name' | 'address' | 'phone' | 'country' | 'timeZone' | 'currency' | 'skinTestLeadHours'> };

/** The end of the online flow: what is booked, when (salon time), where, what to bring, and the calendar file. */
export function BookedPage({ booking, salon }: Props) {
  const first = booking.sittings[0];
  // Read from the send log, and again while a message is still on its way.
  const confirmation = useQuery({
    ...onlineBookingQueries.confirmation(booking.id),
    refetchInterval: (query) => (query.state.data?.sends.some((s) => s.status === 'sending') ? 2_000 : false),
  });
  return (
    <div className="mx-auto flex w-full max-w-2xl flex-col gap-5">
      <div>
        <p className="text-sm font-bold text-ink/80">{salon.name}</p>
        <h1 className="text-3xl font-extrabold tracking-tight">You&apos;re booked</h1>
      </div>
      {confirmation.data && (
        <div role="status" className="flex flex-col gap-1 rounded-lg border-l-4 border-sage bg-white px-4 py-3 font-bold">
          {confirmationWords(confirmation.data).map((line) => (
            <p key={line}>{line}</p>
          ))}
        </div>
      )}
      <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-2 rounded-2xl bg-white p-5 ring-1 ring-ink/10">
        <dt className="font-bold">Service</dt>
        <dd>{booking.service.name}</dd>
        <dt className="font-bold">With</dt>
        <dd>{booking.stylist.name}</dd>
        {first && (
          <>
            <dt className="font-bold">When</dt>
            <dd>
              {formatDate(first.start, formatFor(salon.timeZone), { width: 'short' })},{' '}
              <span className="tabular">{formatRange(first.start, first.end, formatFor(salon.timeZone))}</span>
              <span className="block text-sm text-ink/80">Salon time: {formatZone(formatFor(salon.timeZone), first.start.slice(0, 10))}</span>
            </dd>
          </>
        )}
        <dt className="font-bold">Where</dt>
        <dd>
          {salon.address}
          <span className="block text-sm">
            <a href={telHref(salon.phone)} className="text-link">
              {formatPhone(salon.phone, salon.country)}
            </a>
          </span>
        </dd>
        {booking.depositCents > 0 && (
          <>
            <dt className="font-bold">Deposit paid</dt>
            <dd className="tabular">{formatMoney(booking.depositCents, salon.currency)}</dd>
          </>
        )}
      </dl>
      <section aria-labelledby="bring-heading" className="rounded-2xl bg-white p-5 ring-1 ring-ink/10">
        <h2 id="bring-heading" className="mb-2 text-xl font-bold">
          What to bring and do
        </h2>
        <ul className="flex list-disc flex-col gap-2 pl-5">
          <li>Come with your hair as you usually wear it, dry and without styling product, so its colour and condition show.</li>
          <li>Bring photos of looks you like and of past colour, and the names of any colour used at home (box dye, henna, lightener).</li>
          <li>Tell us about allergies, skin reactions and medicines. {skinTestWords(salon.skinTestLeadHours)}</li>
          <li>Arrive a few minutes early. To move or cancel, use My bookings; the salon&apos;s cancellation policy applies.</li>
        </ul>
      </section>
      <div className="flex flex-col gap-3 sm:flex-row sm:items-center">
        <a href={urlOf(onlineBookingApi.calendarFile, { params: { id: booking.id } })} download className={buttonClasses('primary')}>
          Add to calendar
        </a>
        <Link to={paths.me} className={buttonClasses('secondary')}>
          See my bookings
        </Link>
      </div>
    </div>
  );
}
