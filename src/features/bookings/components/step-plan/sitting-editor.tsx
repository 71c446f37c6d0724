import { useFieldArray, useFormContext } from 'react-hook-form';
import { fieldError } from '@client/lib/form-errors';
import { Button } from '@client/components/ui/button';
import { TextField } from '@client/components/ui/text-field';
import type { StepPlanFormInput } from '@client/features/bookings/step-plan-form';
import { stepOfKind } from '@client/features/bookings/step-plan-form';
import { StepRow } from './step-row';

type Props = { index: number; of: number };

/** The steps of one sitting and, from the second sitting on, how many days after the previous one. */
export function SittingEditor({ index, of }: Props) {
  const { control, register, formState } = useFormContext<StepPlanFormInput>();
  const base = `stepPlan.sittings.${index}` as const;
  const steps = useFieldArray({ control, name: `${base}.steps` });
  const error = (field: string) => fieldError(formState.errors, `${base}.${field}`);
  return (
    <fieldset className="flex flex-col gap-3 rounded-xl p-4 ring-1 ring-ink/15">
      <legend className="px-1 text-lg font-bold">{of > 1 ? `Sitting ${index + 1} of ${of}` : 'Steps'}</legend>
      {index > 0 && (
        <div className="flex flex-wrap gap-3">
          <TextField
            label="Days after the previous sitting, at least"
            type="number"
            inputMode="numeric"
            className="w-64"
            error={error('daysAfterPrevious.min') ?? error('daysAfterPrevious')}
            {...register(`${base}.daysAfterPrevious.min`, { valueAsNumber: true })}
          />
          <TextField
            label="At most"
            type="number"
            inputMode="numeric"
            className="w-28"
            error={error('daysAfterPrevious.max')}
            {...register(`${base}.daysAfterPrevious.max`, { valueAsNumber: true })}
          />
        </div>
      )}
      <ol className="flex flex-col gap-2">
        {steps.fields.map((field, i) => (
          <StepRow
            key={field.id}
            path={`${base}.steps.${i}`}
            number={i + 1}
            count={steps.fields.length}
            onMove={(by) => steps.move(i, i + by)}
            onRemove={() => steps.remove(i)}
            onReplace={(step) => steps.update(i, step)}
          />
        ))}
      </ol>
      {error('steps') && <p className="text-sm font-bold text-brick">{error('steps')}</p>}
      <div>
        <Button variant="secondary" onClick={() => steps.append(stepOfKind('hands_on'))}>
          Add a step{of > 1 ? ` to sitting ${index + 1}` : ''}
        </Button>
      </div>
    </fieldset>
  );
}
