import { zodResolver } from '@hookform/resolvers/zod';
import { DateTime } from 'luxon';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import type { BookingView } from '../../../../shared/schemas/booking-view.schemas';
import { LocalDateSchema } from '../../../../shared/schemas/common.schemas';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { SectionCard } from '../../../components/ui/section-card';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { localDateOf, localToInstant } from '../../../lib/time';
import { useMoveSitting } from '../../bookings/api/booking-mutations';

const MoveFormSchema = z.object({
  sitting: z.string(),
  date: LocalDateSchema,
  time: z.string().regex(/^\d{2}:\d{2}$/, 'Enter a time'),
  stylistId: z.string(),
});
type MoveForm = z.infer<typeof MoveFormSchema>;

type Props = { booking: BookingView; timeZone: string; stylists: { id: string; name: string }[] };

/** Move one sitting to a new day and time (and, if wanted, another stylist); the server re-checks everything. */
export function MoveSittingForm({ booking, timeZone, stylists }: Props) {
  const move = useMoveSitting();
  // The date and time boxes start at the chosen sitting's current start.
  const startOf = (seq: string) => {
    const sitting = booking.sittings.find((s) => String(s.seq) === seq);
    return sitting
      ? { date: localDateOf(sitting.start, timeZone), time: DateTime.fromISO(sitting.start, { zone: timeZone }).toFormat('HH:mm') }
      : { date: '', time: '' };
  };
  const { register, handleSubmit, setError, setValue, formState } = useForm<MoveForm>({
    resolver: zodResolver(MoveFormSchema),
    defaultValues: { sitting: '1', ...startOf('1'), stylistId: '' },
  });
  const { errors } = formState;
  const submit = handleSubmit((values) => {
    const start = localToInstant(values.date, values.time, timeZone);
    if (!start) return setError('date', { message: 'That date and time do not exist' });
    move.mutate({ bookingId: booking.id, sitting: Number(values.sitting), start, stylistId: values.stylistId || undefined });
  });
  const others = stylists.filter((s) => s.id !== booking.stylist.id);
  return (
    <SectionCard title="Move a sitting">
      <form aria-label="Move a sitting" noValidate onSubmit={submit} className="flex flex-col gap-4">
        {move.isError && (
          <Notice tone="danger" title="This move is not possible">
            {move.error.message}
          </Notice>
        )}
        {move.isSuccess && <Notice tone="info" title="Moved. The calendar and the history show the new time." />}
        <div className="grid gap-4 sm:grid-cols-2">
          <SelectField
            label="Sitting"
            options={booking.sittings.map((s) => ({ value: String(s.seq), label: s.of > 1 ? `Sitting ${s.seq} of ${s.of}` : 'The sitting' }))}
            {...register('sitting', {
              onChange: (event) => {
                const { date, time } = startOf(event.target.value);
                setValue('date', date);
                setValue('time', time);
              },
            })}
          />
          <SelectField
            label="Stylist"
            options={[{ value: '', label: `Same stylist (${booking.stylist.name})` }, ...others.map((s) => ({ value: s.id, label: s.name }))]}
            {...register('stylistId')}
          />
          <TextField label="New date" type="date" error={errors.date?.message} {...register('date')} />
          <TextField label="New start time" type="time" step={300} hint="Salon time" error={errors.time?.message} {...register('time')} />
        </div>
        <div>
          <Button type="submit" busy={move.isPending}>
            Move
          </Button>
        </div>
      </form>
    </SectionCard>
  );
}
