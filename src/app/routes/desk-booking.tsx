import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { IdSchema, LocalDateSchema } from '@shared/schemas/common.schemas';
import { PageHeader } from '@client/components/ui/page-header';
import { TimeZoneNote } from '@client/components/ui/time-zone-note';
import { paths } from '@client/config/paths';
import { BookingHistory } from '@client/features/bookings/components/desk-booking/booking-history';
import { BookingSummary } from '@client/features/bookings/components/desk-booking/booking-summary';
import { CancelBookingForm } from '@client/features/bookings/components/desk-booking/cancel-booking-form';
import { MoveSittingForm } from '@client/features/bookings/components/desk-booking/move-sitting-form';
import { ChangePlanForm } from '@client/features/bookings/components/desk-booking/change-plan-form';
import { bookingQueries } from '@client/features/bookings/api/booking-queries';
import { catalogueQueries } from '@client/features/catalogue/api/catalogue-queries';
import { MixLogSection } from '@client/features/mix-log/components/mix-log-section';
import { DepositPanel } from '@client/features/deposits/components/deposit-panel';
import { CheckoutLinkCard } from '@client/features/desk-checkout/components/checkout-link-card';
import { depositQueries } from '@client/features/deposits/api/deposit-queries';
import { PaymentsPanel } from '@client/features/refunds/components/payments-panel';
import { refundQueries } from '@client/features/refunds/api/refund-queries';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { localDateOf } from '@shared/time/salon-time';
import { queryClient } from '@client/lib/query-client';

export async function loader({ params }: LoaderFunctionArgs) {
  if (!IdSchema.safeParse(params.id).success) throw new Response(null, { status: 404 });
  await Promise.all([
    queryClient.ensureQueryData(bookingQueries.one(params.id!)),
    queryClient.ensureQueryData(salonQueries.current()),
    queryClient.ensureQueryData(catalogueQueries.stylists()),
    queryClient.ensureQueryData(depositQueries.ofBooking(params.id!)),
    queryClient.ensureQueryData(refundQueries.ofBooking(params.id!)),
  ]);
  return null;
}

export function Component() {
  const { id } = useParams();
  const [search] = useSearchParams();
  const { data: booking } = useSuspenseQuery(bookingQueries.one(id!));
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  const { data: stylists } = useSuspenseQuery(catalogueQueries.stylists());
  const first = booking.sittings[0];
  // Only a held or booked booking can still be moved or cancelled (the server refuses the rest).
  const open = booking.status === 'booked' || booking.status === 'held';
  // `?sitting=2&from=2027-06-10` opens the move form on that sitting, with free times from that date.
  const sitting = Number(search.get('sitting'));
  const from = LocalDateSchema.safeParse(search.get('from'));
  const initial = booking.sittings.some((s) => s.seq === sitting) ? { sitting, from: from.success ? from.data : undefined } : undefined;
  return (
    <div className="flex flex-col gap-6">
      <Link to={paths.desk(first ? localDateOf(first.start, salon.timeZone) : undefined)} className="text-link">
        ← Back to the book
      </Link>
      <PageHeader title={`${booking.client.name} · ${booking.service.name}`} subtitle={<TimeZoneNote timeZone={salon.timeZone} />} />
      <BookingSummary booking={booking} timeZone={salon.timeZone} currency={salon.currency} />
      <CheckoutLinkCard bookingId={booking.id} status={booking.status} />
      <DepositPanel bookingId={booking.id} bookingStatus={booking.status} timeZone={salon.timeZone} />
      <PaymentsPanel bookingId={booking.id} timeZone={salon.timeZone} />
      <div className="grid gap-6 lg:grid-cols-2">
        {open && <MoveSittingForm booking={booking} timeZone={salon.timeZone} stylists={stylists.stylists} initial={initial} />}
        {(open || booking.status === 'cancelled') && <CancelBookingForm booking={booking} currency={salon.currency} />}
      </div>
      {booking.status === 'booked' && <ChangePlanForm key={JSON.stringify(booking.stepPlan)} booking={booking} />}
      <MixLogSection bookingId={booking.id} timeZone={salon.timeZone} clientId={booking.client.id} currency={salon.currency} />
      <BookingHistory bookingId={booking.id} timeZone={salon.timeZone} currency={salon.currency} stylists={stylists.stylists} />
    </div>
  );
}
