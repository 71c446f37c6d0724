import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { LoadingState } from '@client/components/ui/loading-state';
import { TextField } from '@client/components/ui/text-field';
import { problemText } from '@client/lib/api-error';
import { myBookingQueries } from '@client/features/bookings/api/my-booking-queries';
import { useCancelMyBooking } from '@client/features/bookings/api/my-booking-mutations';
import { CancelTermsNotice } from '../cancel-terms-notice';

type Props = { bookingId: string; onClose: () => void; onCancelled: () => void };

/** Cancelling, terms first: what happens to the deposit is shown before the client confirms. */
export function CancelPanel({ bookingId, onClose, onCancelled }: Props) {
  const terms = useQuery(myBookingQueries.cancelTerms(bookingId));
  const cancel = useCancelMyBooking(bookingId);
  const [reason, setReason] = useState('');
  // The refreshed list hides this panel (the booking is no longer upcoming) possibly before a per-call
  // onSuccess would run, so the outcome is taken from the promise, which always settles.
  const confirm = () => cancel.mutateAsync(reason.trim() ? { reason: reason.trim() } : {}).then(onCancelled, () => undefined);
  if (terms.isPending) return <LoadingState label="Checking the cancellation terms…" />;
  if (terms.isError) return <FormAlert>{problemText(terms.error)}</FormAlert>;
  return (
    <div className="flex flex-col gap-3">
      <CancelTermsNotice terms={terms.data} />
      <TextField label="Reason (optional)" value={reason} maxLength={500} onChange={(event) => setReason(event.target.value)} />
      {cancel.isError && <FormAlert>{problemText(cancel.error)}</FormAlert>}
      <div className="flex flex-col gap-2 sm:flex-row">
        <Button busy={cancel.isPending} onClick={confirm}>
          {cancel.isPending ? 'Cancelling…' : 'Confirm cancellation'}
        </Button>
        <Button variant="secondary" onClick={onClose}>
          Keep this booking
        </Button>
      </div>
    </div>
  );
}
