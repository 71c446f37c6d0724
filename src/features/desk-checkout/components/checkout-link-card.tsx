import { Link } from 'react-router-dom';
import type { BookingStatus } from '@shared/schemas/common.schemas';
import { buttonClasses } from '@client/components/ui/button';
import { SectionCard } from '@client/components/ui/section-card';
import { paths } from '@client/config/paths';

type Props = { bookingId: string; status: BookingStatus };

/** On a booking's page: check the visit out once the client has arrived, or its receipt once checked out. */
export function CheckoutLinkCard({ bookingId, status }: Props) {
  if (status === 'checked_out') {
    return (
      <SectionCard title="Checkout">
        <p className="mb-3">This visit is checked out and paid.</p>
        <Link className={buttonClasses('secondary')} to={paths.deskCheckout(bookingId)}>
          See the receipt
        </Link>
      </SectionCard>
    );
  }
  if (status !== 'checked_in' && status !== 'finished') return null;
  return (
    <SectionCard title="Checkout">
      <p className="mb-3">When the visit ends: services, products, discount, tax, the deposit paid and a tip, paid by card, cash or both.</p>
      <Link className={buttonClasses('primary')} to={paths.deskCheckout(bookingId)}>
        Check out
      </Link>
    </SectionCard>
  );
}
