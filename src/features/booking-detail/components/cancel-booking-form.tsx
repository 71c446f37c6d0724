import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { CancelBookingSchema } from '../../../../shared/schemas/booking.schemas';
import type { BookingView } from '../../../../shared/schemas/booking-view.schemas';
import { Button } from '../../../components/ui/button';
import { FieldFrame } from '../../../components/ui/field-frame';
import { FormAlert } from '../../../components/ui/form-alert';
import { SectionCard } from '../../../components/ui/section-card';
import { showServerErrors } from '../../../lib/form-errors';
import { useCancelBooking } from '../../bookings/api/booking-mutations';

type Props = { booking: BookingView };

/** Cancel with a reason; the salon's policy decides whether the deposit is kept or refunded. */
export function CancelBookingForm({ booking }: Props) {
  const cancel = useCancelBooking(booking.id);
  const { register, handleSubmit, setError, formState } = useForm<z.input<typeof CancelBookingSchema>>({
    resolver: zodResolver(CancelBookingSchema),
    defaultValues: { reason: '' },
  });
  const { errors } = formState;
  if (booking.status === 'cancelled') {
    const outcome = booking.depositOutcome === 'kept' ? 'The deposit is kept.' : booking.depositOutcome === 'refunded' ? 'The deposit is refunded.' : '';
    return (
      <SectionCard title="Cancel">
        <FormAlert tone="success">This booking is cancelled. {outcome}</FormAlert>
      </SectionCard>
    );
  }
  const submit = handleSubmit((body) => cancel.mutateAsync(body).catch((error) => showServerErrors(error, setError, ['reason'])));
  return (
    <SectionCard title="Cancel">
      <form aria-label="Cancel booking" noValidate onSubmit={submit} className="flex flex-col gap-3">
        {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
        <FieldFrame
          label="Reason"
          hint="Cancelling frees every sitting. The salon's cancellation policy decides whether the deposit is kept or refunded."
          error={errors.reason?.message}
        >
          {(control) => (
            <textarea {...control} rows={3} className="rounded-lg border border-ink/40 bg-white px-3 py-2 aria-invalid:border-brick" {...register('reason')} />
          )}
        </FieldFrame>
        <div>
          <Button type="submit" variant="secondary" busy={cancel.isPending}>
            Cancel booking
          </Button>
        </div>
      </form>
    </SectionCard>
  );
}
