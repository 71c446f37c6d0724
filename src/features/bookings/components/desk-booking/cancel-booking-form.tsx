import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { CancelBookingSchema } from '@shared/schemas/booking.schemas';
import type { BookingView } from '@shared/schemas/booking-view.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { LoadingState } from '@client/components/ui/loading-state';
import { SectionCard } from '@client/components/ui/section-card';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { problemText } from '@client/lib/api-error';
import { depositOutcomeText } from '@client/lib/booking-labels';
import { showServerErrors } from '@client/lib/form-errors';
import { bookingQueries } from '@client/features/bookings/api/booking-queries';
import { useCancelBooking } from '@client/features/bookings/api/booking-mutations';
import { CancelTermsNotice } from '../cancel-terms-notice';

type Props = { booking: BookingView; currency: string };
type Reason = z.input<typeof CancelBookingSchema>;

/**
 * Cancel in two steps: a reason, then the deposit outcome (kept or refunded, and the rule that decides it) read
 * before "Confirm cancellation". Nothing changes until then.
 */
export function CancelBookingForm({ booking, currency }: Props) {
  const cancel = useCancelBooking(booking.id);
  const [confirming, setConfirming] = useState<Reason | null>(null);
  const terms = useQuery({ ...bookingQueries.cancelTerms(booking.id), enabled: confirming !== null && booking.status !== 'cancelled' });
  const { register, handleSubmit, setError, formState } = useForm<Reason>({
    resolver: zodResolver(CancelBookingSchema),
    defaultValues: { reason: '' },
  });
  const { errors } = formState;
  if (booking.status === 'cancelled') {
    return (
      <SectionCard title="Cancel">
        <FormAlert tone="success">This booking is cancelled. {terms.data?.message ?? depositOutcomeText(booking, currency)}</FormAlert>
      </SectionCard>
    );
  }
  const confirm = () =>
    confirming &&
    cancel.mutateAsync(confirming).catch((error) => {
      setConfirming(null);
      showServerErrors(error, setError, ['reason']);
    });
  return (
    <SectionCard title="Cancel">
      <form aria-label="Cancel booking" noValidate onSubmit={handleSubmit(setConfirming)} className="flex flex-col gap-3">
        {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
        <TextAreaField
          label="Reason"
          hint="Cancelling frees every sitting. You will see what happens to the deposit before anything changes."
          error={errors.reason?.message}
          readOnly={confirming !== null}
          {...register('reason')}
        />
        {confirming === null ? (
          <div>
            <Button type="submit" variant="secondary">
              Cancel booking…
            </Button>
          </div>
        ) : (
          <div className="flex flex-col gap-3">
            {terms.isPending && <LoadingState label="Checking the cancellation terms…" />}
            {terms.isError && <FormAlert>{problemText(terms.error)}</FormAlert>}
            {terms.data && <CancelTermsNotice terms={terms.data} />}
            <div className="flex flex-col gap-2 sm:flex-row">
              <Button busy={cancel.isPending} disabled={!terms.data} onClick={confirm}>
                {cancel.isPending ? 'Cancelling…' : 'Confirm cancellation'}
              </Button>
              <Button variant="secondary" onClick={() => setConfirming(null)}>
                Keep this booking
              </Button>
            </div>
          </div>
        )}
      </form>
    </SectionCard>
  );
}
