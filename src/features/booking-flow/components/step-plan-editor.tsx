import { useFieldArray, useFormContext } from 'react-hook-form';
import { sittingMaxMinutes } from '../../../../shared/schemas/step-plan.schemas';
import { formatMinutes } from '../../../lib/time';
import type { BookFormInput } from '../book-form-schema';
import { SittingEditor } from './sitting-editor';

/** The chosen service's step plan, editable for this booking only (the menu keeps its own). */
export function StepPlanEditor() {
  const { control, watch } = useFormContext<BookFormInput>();
  const sittings = useFieldArray({ control, name: 'stepPlan.sittings' });
  const plan = watch('stepPlan');
  const longest = sittingMaxMinutes({ sittings: plan.sittings.map((s) => ({ ...s, steps: s.steps.map(numberOrZero) })) });
  return (
    <details className="rounded-xl bg-white ring-1 ring-ink/15" open={false}>
      <summary className="cursor-pointer px-4 py-3">
        <span className="font-bold">Step plan for this booking</span>{' '}
        <span className="text-ink/80">
          — {sittings.fields.length} {sittings.fields.length === 1 ? 'sitting' : 'sittings'}, up to {longest.map(formatMinutes).join(' + ')}. Open to change steps, minutes or days between sittings.
        </span>
      </summary>
      <div className="flex flex-col gap-4 border-t border-ink/10 p-4">
        {sittings.fields.map((field, i) => (
          <SittingEditor key={field.id} index={i} of={sittings.fields.length} />
        ))}
      </div>
    </details>
  );
}

// While someone is typing, a minutes box can be empty (NaN): count it as 0 in the summary.
function numberOrZero<T extends Record<string, unknown>>(step: T): T {
  return Object.fromEntries(Object.entries(step).map(([k, v]) => [k, typeof v === 'number' && Number.isNaN(v) ? 0 : v])) as T;
}
