import { zodResolver } from '@hookform/resolvers/zod';
import type { FormEvent, ReactNode } from 'react';
import { useForm, type DefaultValues, type FieldValues, type Path } from 'react-hook-form';
import type { ZodType } from 'zod';
import { showServerErrors } from '@client/lib/form-errors';
import { Button } from './button';
import { FormAlert } from './form-alert';

/**
 * A form that records one thing (a test, a reading, a consent): checked with the same schema as the server's,
 * cleared once stored, and the server's messages put on its fields (or on the whole form).
 */
export function useRecordForm<Input extends FieldValues, Output>(
  schema: ZodType<Output, Input>,
  defaultValues: DefaultValues<Input>,
  store: (values: Output) => Promise<unknown>,
  fields: readonly Path<Input>[],
  { clearWhenStored = true } = {},
) {
  const form = useForm<Input, unknown, Output>({ resolver: zodResolver(schema), defaultValues });
  const submit = form.handleSubmit((values) =>
    store(values).then(
      () => {
        if (clearWhenStored) form.reset();
      },
      (error: unknown) => showServerErrors(error, form.setError, fields),
    ),
  );
  return { form, submit };
}

type Props = {
  /** The form's accessible name. */
  label: string;
  /** A heading shown inside the frame, when the section around it does not name it already. */
  title?: string;
  submitLabel: string;
  busy: boolean;
  /** A message about the whole form (the server's, when it names no field). */
  error?: string;
  onSubmit: (event: FormEvent) => Promise<unknown>;
  className?: string;
  children: ReactNode;
};

/** The frame of a record form: its heading, a message about the whole form, the fields and one submit button. */
export function RecordForm({
  label,
  title,
  submitLabel,
  busy,
  error,
  onSubmit,
  className = 'flex flex-col gap-3 rounded-lg p-3 ring-1 ring-ink/15',
  children,
}: Props) {
  return (
    <form onSubmit={(e) => void onSubmit(e)} noValidate aria-label={label} className={className}>
      {title && <p className="font-bold">{title}</p>}
      {error && <FormAlert>{error}</FormAlert>}
      {children}
      <div>
        <Button type="submit" variant="secondary" busy={busy}>
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}
