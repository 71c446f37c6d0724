import type { ReactNode } from 'react';
import { useFieldArray, useFormContext } from 'react-hook-form';
import { fieldError } from '@client/lib/form-errors';
import { Button } from '@client/components/ui/button';
import { TextField } from '@client/components/ui/text-field';
import type { StepPlanFormInput } from '@client/features/bookings/step-plan-form';
import { stepOfKind } from '@client/features/bookings/step-plan-form';
import { StepRow } from './step-row';

/** New minutes for a step: a fixed step's minutes, or a developing step's least and most. */
export type StepMinutes = { minutes: number } | { minMinutes: number; maxMinutes: number };

/** One step as a note beside it sees it: which step (sitting from 1, label, the label's time in the sitting) and a way to set its minutes. */
export interface StepNoteInput {
  sitting: number;
  label: string;
  occurrence: number;
  kind: 'hands_on' | 'developing' | 'basin';
  /** "step 2", for accessible names (the step row's own words). */
  name: string;
  apply: (minutes: StepMinutes) => void;
}
export type StepNote = (step: StepNoteInput) => ReactNode;

type Props = { index: number; of: number; stepNote?: StepNote };

/** The steps of one sitting and, from the second sitting on, how many days after the previous one. */
export function SittingEditor({ index, of, stepNote }: Props) {
  const { control, register, formState, watch, setValue } = useFormContext<StepPlanFormInput>();
  const base = `stepPlan.sittings.${index}` as const;
  const steps = useFieldArray({ control, name: `${base}.steps` });
  const error = (field: string) => fieldError(formState.errors, `${base}.${field}`);
  const current = watch(`${base}.steps`);
  const noteFor = (i: number): ReactNode => {
    const step = current[i];
    if (!stepNote || !step) return null;
    const path = `${base}.steps.${i}` as const;
    const set = { shouldDirty: true, shouldValidate: true };
    return stepNote({
      sitting: index + 1,
      label: step.label,
      // Which time this label comes in the sitting: a second "Rinse" is its own step.
      occurrence: current.slice(0, i + 1).filter((s) => s.label === step.label).length,
      kind: step.kind,
      name: `step ${i + 1}`,
      apply: (minutes) => {
        if ('minutes' in minutes) setValue(`${path}.minutes`, minutes.minutes, set);
        else {
          setValue(`${path}.minMinutes`, minutes.minMinutes, set);
          setValue(`${path}.maxMinutes`, minutes.maxMinutes, set);
        }
      },
    });
  };
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
            note={noteFor(i)}
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
