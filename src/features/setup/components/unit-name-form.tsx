import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { UnitNameSchema } from '@shared/schemas/setup.schemas';
import { Button } from '@client/components/ui/button';
import { TextField } from '@client/components/ui/text-field';
import { showServerErrors } from '@client/lib/form-errors';

type Props = { label: string; submitLabel: string; initial?: string; onSave: (name: string) => Promise<unknown> };

/** The one field a chair or basin has: its name (add or rename). */
export function UnitNameForm({ label, submitLabel, initial = '', onSave }: Props) {
  const form = useForm<z.infer<typeof UnitNameSchema>>({ resolver: zodResolver(UnitNameSchema), defaultValues: { name: initial } });
  const { errors, isSubmitting } = form.formState;
  const submit = form.handleSubmit(({ name }) =>
    onSave(name).then(
      () => form.reset({ name: initial }),
      (error) => showServerErrors(error, form.setError, ['name']),
    ),
  );
  return (
    <form aria-label={label} noValidate onSubmit={submit} className="flex flex-wrap items-end gap-3">
      <TextField label={label} error={errors.name?.message ?? errors.root?.server?.message} {...form.register('name')} />
      <Button type="submit" variant="secondary" busy={isSubmitting}>
        {submitLabel}
      </Button>
    </form>
  );
}
