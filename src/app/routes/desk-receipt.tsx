import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { IdSchema } from '@shared/schemas/common.schemas';
import { formatDateTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { paths } from '@client/config/paths';
import { deskCheckoutQueries } from '@client/features/desk-checkout/api/desk-checkout-queries';
import { ReceiptTable } from '@client/features/desk-checkout/components/receipt-table';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { queryClient } from '@client/lib/query-client';

export async function loader({ params }: LoaderFunctionArgs) {
  if (!IdSchema.safeParse(params.id).success) throw new Response(null, { status: 404 });
  await Promise.all([queryClient.ensureQueryData(deskCheckoutQueries.ofBooking(params.id!)), queryClient.ensureQueryData(salonQueries.current())]);
  return null;
}

/** The printable receipt: the page's own header and links stay off paper (print:hidden). */
export function Component() {
  const { id } = useParams();
  const { data: visit } = useSuspenseQuery(deskCheckoutQueries.ofBooking(id!));
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  const checkout = visit.checkout;
  if (!checkout || checkout.status !== 'paid') {
    return (
      <Notice tone="caution" title="No receipt yet">
        This visit is not checked out and paid yet.
      </Notice>
    );
  }
  const methods = [...new Set(checkout.payments.map((p) => (p.method === 'cash' ? 'cash' : 'card')))];
  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-center justify-between gap-3 print:hidden">
        <Link to={paths.deskCheckout(visit.bookingId)} className="text-link">
          ← Back to the checkout
        </Link>
        <Button onClick={() => window.print()}>Print</Button>
      </div>
      <article aria-label="Receipt" className="mx-auto flex w-full max-w-md flex-col gap-4 rounded-lg border border-edge bg-white p-6 print:border-0 print:p-0">
        <header>
          <h1 className="text-xl font-bold">{visit.salonName}</h1>
          <p>Receipt for {visit.clientName}</p>
          {checkout.paidAt && <p className="tabular text-sm">{formatDateTime(checkout.paidAt, formatFor(salon.timeZone))}</p>}
        </header>
        <ReceiptTable receipt={checkout.receipt} stylists={visit.stylists} caption="Receipt" />
        <p>Paid by {methods.length > 0 ? methods.join(' and ') : 'the deposit'}.</p>
      </article>
    </div>
  );
}
