import { useFieldArray, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import type { HairHistory } from '@shared/schemas/hair-history.schemas';
import { Button } from '@client/components/ui/button';
import { TextField } from '@client/components/ui/text-field';
import { fieldError } from '@client/lib/form-errors';

type Props = { control: Control<HairHistory>; register: UseFormRegister<HairHistory>; errors: FieldErrors<HairHistory> };

const MAX = 20;

/** Past colour services as a list the client can grow and shrink, one row per service. */
export function PastServicesFields({ control, register, errors }: Props) {
  const { fields, append, remove } = useFieldArray({ control, name: 'pastServices' });
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-1 font-bold">Colour services you have had, and when</legend>
      {fields.length === 0 && <p className="text-ink/80">None listed yet.</p>}
      <ol className="flex flex-col gap-3">
        {fields.map((field, i) => (
          <li key={field.id} className="grid gap-2 rounded-lg bg-linen p-3 sm:grid-cols-[1fr_12rem_auto] sm:items-end">
            <TextField
              label={`Service ${i + 1}`}
              placeholder="e.g. Full head highlights"
              error={fieldError(errors, `pastServices.${i}.service`)}
              {...register(`pastServices.${i}.service`)}
            />
            <TextField label="When" placeholder="e.g. May 2026" error={fieldError(errors, `pastServices.${i}.when`)} {...register(`pastServices.${i}.when`)} />
            <Button variant="quiet" onClick={() => remove(i)} aria-label={`Remove service ${i + 1}`}>
              Remove
            </Button>
          </li>
        ))}
      </ol>
      {fields.length < MAX && (
        <div>
          <Button variant="secondary" onClick={() => append({ service: '', when: '' })}>
            Add a service
          </Button>
        </div>
      )}
    </fieldset>
  );
}
