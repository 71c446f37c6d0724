import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { UtilisationQuerySchema, type UtilisationQuery } from '@shared/schemas/utilisation.schemas';
import { Button } from '@client/components/ui/button';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';

type Props = { value: UtilisationQuery; onChange: (next: UtilisationQuery) => void };
type FormValues = { period: NonNullable<UtilisationQuery['period']>; date: string; from: string; to: string };

const kinds = [
  { value: 'day', label: 'Day' },
  { value: 'week', label: 'Week (Monday to Sunday)' },
  { value: 'month', label: 'Month' },
  { value: 'custom', label: 'Custom (up to 2 years)' },
];

/** Which period the figures cover; checked with the same schema the server uses. */
export function PeriodPicker({ value, onChange }: Props) {
  const form = useForm<FormValues, unknown, z.output<typeof UtilisationQuerySchema>>({
    resolver: (values, context, options) =>
      zodResolver(UtilisationQuerySchema)(
        values.period === 'custom'
          ? { period: values.period, from: values.from || undefined, to: values.to || undefined }
          : { period: values.period, date: values.date || undefined },
        context,
        options as never,
      ) as never,
    defaultValues: { period: value.period ?? 'week', date: value.date ?? '', from: value.from ?? '', to: value.to ?? '' },
  });
  const period = useWatch({ control: form.control, name: 'period' });
  const { errors } = form.formState;
  const submit = form.handleSubmit((q) => onChange(q));
  return (
    <form aria-label="Choose the period" noValidate onSubmit={submit} className="flex flex-wrap items-end gap-4 print:hidden">
      <SelectField label="Period" options={kinds} {...form.register('period')} />
      {period === 'custom' ? (
        <>
          <TextField label="First day" type="date" error={errors.from?.message} {...form.register('from')} />
          <TextField label="Last day" type="date" error={errors.to?.message} {...form.register('to')} />
        </>
      ) : (
        <TextField label="Any day in it" hint="Empty: today" type="date" error={errors.date?.message} {...form.register('date')} />
      )}
      <Button type="submit">Show figures</Button>
    </form>
  );
}
