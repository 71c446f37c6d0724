import { useParams } from 'react-router-dom';
import { HoldPaidPage } from '@client/features/online-booking/components/hold-paid-page';

/** The return from the payment service's page after paying a held time (the page waits for the confirmation). */
export function Component() {
  const { id = '' } = useParams();
  return <HoldPaidPage holdId={id} />;
}
