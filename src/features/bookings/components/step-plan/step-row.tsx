import type { ReactNode } from 'react';
import { useFormContext } from 'react-hook-form';
import { fieldError } from '@client/lib/form-errors';
import { PRODUCT_FAMILIES, type PlannedStep } from '@shared/schemas/step-plan.schemas';
import { productFamilyShortLabels } from '@shared/rules/skin-test-need';
import { Button } from '@client/components/ui/button';
import { SelectField } from '@client/components/ui/select-field';
import { StepKindIcon } from '@client/components/ui/step-kind-icon';
import { TextField } from '@client/components/ui/text-field';
import { stepKindLabels } from '@client/lib/booking-labels';
import type { StepPlanFormInput } from '@client/features/bookings/step-plan-form';
import { stepOfKind } from '@client/features/bookings/step-plan-form';

type Props = {
  path: `stepPlan.sittings.${number}.steps.${number}`;
  number: number;
  count: number;
  onMove: (by: -1 | 1) => void;
  onRemove: () => void;
  onReplace: (step: PlannedStep) => void;
  /** Shown across the row under the step's fields. */
  note?: ReactNode;
};

const kindOptions = (['hands_on', 'developing', 'basin'] as const).map((kind) => ({ value: kind, label: stepKindLabels[kind] }));
// A new step starts on "Choose…": a colour step must never fall back to "nothing" by oversight.
const productOptions = [{ value: '', label: 'Choose…' }, ...PRODUCT_FAMILIES.map((f) => ({ value: f, label: productFamilyShortLabels[f] }))];

/** One editable step: kind, label, what it puts on the hair, minutes (or least–most minutes while developing), order. */
export function StepRow({ path, number, count, onMove, onRemove, onReplace, note }: Props) {
  const { register, watch, getValues, formState } = useFormContext<StepPlanFormInput>();
  const step = watch(path);
  const error = (field: string) => fieldError(formState.errors, `${path}.${field}`);
  // A processing-limit problem belongs to the step as a whole (it names the step and the limit).
  const stepError = fieldError(formState.errors, path);
  const name = `step ${number}`;
  return (
    <li className="grid grid-cols-2 items-end gap-3 rounded-lg bg-linen p-3 sm:grid-cols-[auto_10rem_1fr_12rem_auto_auto_auto]">
      <span className="flex items-center gap-1 self-center font-bold tabular">
        <StepKindIcon kind={step.kind} />
        {number}.
      </span>
      <SelectField
        label="Kind"
        aria-label={`Kind of ${name}`}
        options={kindOptions}
        value={step.kind}
        onChange={(event) => onReplace(stepOfKind(event.target.value as PlannedStep['kind'], getValues(path)))}
      />
      <TextField label="Step" aria-label={`Name of ${name}`} error={error('label')} {...register(`${path}.label`)} />
      <SelectField
        label="On the hair"
        aria-label={`What ${name} puts on the hair`}
        options={productOptions}
        error={error('product')}
        {...register(`${path}.product`, { setValueAs: (v: string) => (v === '' ? undefined : v) })}
      />
      {step.kind === 'developing' ? (
        <>
          <TextField
            label="Least min"
            aria-label={`Least minutes of ${name}`}
            type="number"
            inputMode="numeric"
            className="w-24"
            error={error('minMinutes')}
            {...register(`${path}.minMinutes`, { valueAsNumber: true })}
          />
          <TextField
            label="Most min"
            aria-label={`Most minutes of ${name}`}
            type="number"
            inputMode="numeric"
            className="w-24"
            error={error('maxMinutes')}
            {...register(`${path}.maxMinutes`, { valueAsNumber: true })}
          />
        </>
      ) : (
        <TextField
          label="Minutes"
          aria-label={`Minutes of ${name}`}
          type="number"
          inputMode="numeric"
          className="w-24 sm:col-span-2"
          error={error('minutes')}
          {...register(`${path}.minutes`, { valueAsNumber: true })}
        />
      )}
      <div className="col-span-2 flex gap-1 sm:col-span-1">
        <Button variant="quiet" aria-label={`Move ${name} up`} disabled={number === 1} onClick={() => onMove(-1)}>
          ↑
        </Button>
        <Button variant="quiet" aria-label={`Move ${name} down`} disabled={number === count} onClick={() => onMove(1)}>
          ↓
        </Button>
        <Button variant="quiet" aria-label={`Remove ${name}`} disabled={count === 1} onClick={onRemove}>
          Remove
        </Button>
      </div>
      {step.kind === 'developing' && (
        <label className="col-span-full inline-flex min-h-11 items-center gap-2">
          <input type="checkbox" className="size-5" aria-label={`${name} processes with heat`} {...register(`${path}.heat`)} />
          With heat (a hood or processor): the time allowed on the hair is halved
        </label>
      )}
      {note && <div className="col-span-full">{note}</div>}
      {stepError && (
        <p className="col-span-full text-sm font-bold text-brick" role="alert">
          {stepError}
        </p>
      )}
    </li>
  );
}
