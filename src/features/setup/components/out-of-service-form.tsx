import { formatDate } from '@shared/format/date-time';
import { zonelessFormat } from '@shared/format/locale';
import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { OutOfServiceInputSchema, type OutOfServiceInput, type Unit, type UnitKind } from '@shared/schemas/setup.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { TextField } from '@client/components/ui/text-field';
import { showServerErrors } from '@client/lib/form-errors';
import { setupQueries } from '../api/setup-queries';
import { useTakeOutOfService } from '../api/setup-mutations';
import { AffectedBookings } from './affected-bookings';

type Props = { kind: UnitKind; unit: Unit; timeZone: string; onDone: (message: string) => void };

/** Out of service for whole days: first the future bookings that use it then, then the change. */
export function OutOfServiceForm({ kind, unit, timeZone, onDone }: Props) {
  const take = useTakeOutOfService();
  const [checked, setChecked] = useState<OutOfServiceInput | null>(null);
  const form = useForm<OutOfServiceInput>({ resolver: zodResolver(OutOfServiceInputSchema), defaultValues: { from: '', to: '', reason: '' } });
  const { errors } = form.formState;
  const affected = useQuery({ ...setupQueries.unitAffected(kind, unit.id, checked?.from ?? '', checked?.to ?? ''), enabled: Boolean(checked) });
  const check = form.handleSubmit((body) => setChecked(body));
  const confirm = () =>
    checked &&
    take.mutateAsync({ kind, id: unit.id, body: checked }).then(
      (res) =>
        onDone(
          `${unit.name} is out of service from ${formatDate(checked.from, zonelessFormat)} to ${formatDate(checked.to, zonelessFormat)}.${res.bookings.length ? ` ${res.bookings.length} future bookings still use it: move them from the book.` : ''}`,
        ),
      (error) => showServerErrors(error, form.setError, ['from', 'to', 'reason']),
    );
  return (
    <div className="flex flex-col gap-3">
      <form
        aria-label={`Take ${unit.name} out of service`}
        noValidate
        onSubmit={check}
        onChange={() => setChecked(null)}
        className="flex flex-wrap items-end gap-3"
      >
        <TextField label="First day" type="date" error={errors.from?.message} {...form.register('from')} />
        <TextField label="Last day" type="date" error={errors.to?.message} {...form.register('to')} />
        <TextField label="Reason (optional)" error={errors.reason?.message} {...form.register('reason')} />
        <Button type="submit" variant="secondary">
          List affected bookings
        </Button>
      </form>
      {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
      {checked && (
        <div className="flex flex-col gap-3">
          {affected.isPending ? (
            <p>Looking up future bookings…</p>
          ) : (
            <AffectedBookings bookings={affected.data?.bookings ?? []} timeZone={timeZone} label={`Bookings using ${unit.name} then`} />
          )}
          <div>
            <Button busy={take.isPending} onClick={confirm}>
              Take {unit.name} out of service
            </Button>
          </div>
        </div>
      )}
    </div>
  );
}
