import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { IdSchema } from '@shared/schemas/common.schemas';
import { Notice } from '@client/components/ui/notice';
import { PageHeader } from '@client/components/ui/page-header';
import { BookingStatusBadge } from '@client/components/ui/booking-status-badge';
import { paths } from '@client/config/paths';
import { deskCheckoutQueries } from '@client/features/desk-checkout/api/desk-checkout-queries';
import { CheckoutForm } from '@client/features/desk-checkout/components/checkout-form';
import { CheckoutStatus } from '@client/features/desk-checkout/components/checkout-status';
import { queryClient } from '@client/lib/query-client';

/** How often an unpaid card part is asked after (the webhook confirms it at the server). */
const WAIT_MS = 2_000;

export async function loader({ params }: LoaderFunctionArgs) {
  if (!IdSchema.safeParse(params.id).success) throw new Response(null, { status: 404 });
  await queryClient.ensureQueryData(deskCheckoutQueries.ofBooking(params.id!));
  return null;
}

export function Component() {
  const { id } = useParams();
  const [search] = useSearchParams();
  const { data: visit } = useSuspenseQuery({
    ...deskCheckoutQueries.ofBooking(id!),
    refetchInterval: (q) => (q.state.data?.checkout?.status === 'open' ? WAIT_MS : false),
  });
  return (
    <div className="flex flex-col gap-6">
      <Link to={paths.deskBooking(visit.bookingId)} className="text-link">
        ← Back to the booking
      </Link>
      <PageHeader title={`Checkout · ${visit.clientName}`} subtitle={<BookingStatusBadge status={visit.bookingStatus} />} />
      {visit.checkout ? (
        <CheckoutStatus visit={visit} checkout={visit.checkout} returned={search.get('payment')} />
      ) : visit.ready ? (
        <CheckoutForm visit={visit} />
      ) : (
        <Notice tone="caution" title="Not ready for checkout">
          {visit.notReadyReason}
        </Notice>
      )}
    </div>
  );
}
