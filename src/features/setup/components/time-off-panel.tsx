import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { TimeOffInputSchema, type StaffMember, type TimeOffInput } from '@shared/schemas/setup.schemas';
import { Button } from '@client/components/ui/button';
import { ConfirmRemove } from '@client/components/ui/confirm-remove';
import { FormAlert } from '@client/components/ui/form-alert';
import { TextField } from '@client/components/ui/text-field';
import { showServerErrors } from '@client/lib/form-errors';
import { toastDone } from '@client/lib/toast';
import { formatDate } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { useAddTimeOff, useRemoveTimeOff } from '../api/setup-mutations';

/** Whole days off for a stylist, in salon time; planning leaves those days out. */
export function TimeOffPanel({ member, timeZone }: { member: StaffMember; timeZone: string }) {
  const add = useAddTimeOff();
  const remove = useRemoveTimeOff();
  const form = useForm<TimeOffInput>({ resolver: zodResolver(TimeOffInputSchema), defaultValues: { from: '', to: '', reason: '' } });
  const { errors } = form.formState;
  const submit = form.handleSubmit((body) =>
    add.mutateAsync({ id: member.id, body }).then(
      () => form.reset(),
      (error) => showServerErrors(error, form.setError, ['from', 'to', 'reason']),
    ),
  );
  // The end is exclusive (midnight after the last day), so the last day is the one before it.
  const lastDay = (iso: string) => formatDate(new Date(new Date(iso).getTime() - 60_000).toISOString(), formatFor(timeZone), { width: 'short' });
  return (
    <div className="flex flex-col gap-3">
      {remove.isError && <FormAlert>{remove.error.message}</FormAlert>}
      {member.timeOff.length === 0 ? (
        <p>No time off ahead.</p>
      ) : (
        <ul aria-label={`Time off of ${member.details.name}`} className="flex flex-col gap-2">
          {member.timeOff.map((t) => {
            const days = `${formatDate(t.start, formatFor(timeZone), { width: 'short' })} – ${lastDay(t.end)}`;
            return (
              <li key={t.id} className="flex flex-wrap items-center gap-3">
                {days} {t.reason && `· ${t.reason}`}
                <ConfirmRemove
                  what={`${member.details.name}'s time off ${days}`}
                  busy={remove.isPending && remove.variables?.entryId === t.id}
                  onRemove={() =>
                    remove.mutate({ id: member.id, entryId: t.id }, { onSuccess: () => toastDone(`Removed ${member.details.name}'s time off ${days}.`) })
                  }
                />
              </li>
            );
          })}
        </ul>
      )}
      <form aria-label={`Add time off for ${member.details.name}`} noValidate onSubmit={submit} className="flex flex-wrap items-end gap-3">
        {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
        <TextField label="First day off" type="date" error={errors.from?.message} {...form.register('from')} />
        <TextField label="Last day off" type="date" error={errors.to?.message} {...form.register('to')} />
        <TextField label="Reason (optional)" error={errors.reason?.message} {...form.register('reason')} />
        <Button type="submit" variant="secondary" busy={add.isPending}>
          Add time off
        </Button>
      </form>
    </div>
  );
}
