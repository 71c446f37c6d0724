import { useFieldArray, useFormContext } from 'react-hook-form';
import { sittingMaxMinutes } from '../../../../shared/schemas/step-plan.schemas';
import { Button } from '../../../components/ui/button';
import { formatMinutes } from '../../../lib/time';
import { stepOfKind, type BookFormInput } from '../book-form-schema';
import { SittingEditor } from './sitting-editor';

type Props = {
  title?: string;
  open?: boolean;
  /** A quote may add or drop sittings; a booking keeps the service's sittings. */
  sittingsEditable?: boolean;
};

/** The chosen service's step plan, editable for this booking only (the menu keeps its own). */
export function StepPlanEditor({ title = 'Step plan for this booking', open = false, sittingsEditable = false }: Props) {
  const { control, watch } = useFormContext<BookFormInput>();
  const sittings = useFieldArray({ control, name: 'stepPlan.sittings' });
  const plan = watch('stepPlan');
  const longest = sittingMaxMinutes({ sittings: plan.sittings.map((s) => ({ ...s, steps: s.steps.map(numberOrZero) })) });
  return (
    <details className="rounded-xl bg-white ring-1 ring-ink/15" open={open}>
      <summary className="cursor-pointer px-4 py-3">
        <span className="font-bold">{title}</span>{' '}
        <span className="text-ink/80">
          — {sittings.fields.length} {sittings.fields.length === 1 ? 'sitting' : 'sittings'}, up to {longest.map(formatMinutes).join(' + ')}. Open to change steps, minutes or days between sittings.
        </span>
      </summary>
      <div className="flex flex-col gap-4 border-t border-ink/10 p-4">
        {sittings.fields.map((field, i) => (
          <SittingEditor key={field.id} index={i} of={sittings.fields.length} />
        ))}
        {sittingsEditable && (
          <div className="flex flex-wrap gap-3">
            <Button variant="secondary" disabled={sittings.fields.length >= 6} onClick={() => sittings.append({ daysAfterPrevious: { min: 14, max: 42 }, steps: [stepOfKind('hands_on')] })}>
              Add a sitting
            </Button>
            {sittings.fields.length > 1 && (
              <Button variant="quiet" onClick={() => sittings.remove(sittings.fields.length - 1)}>
                Remove sitting {sittings.fields.length}
              </Button>
            )}
          </div>
        )}
      </div>
    </details>
  );
}

// While someone is typing, a minutes box can be empty (NaN): count it as 0 in the summary.
function numberOrZero<T extends Record<string, unknown>>(step: T): T {
  return Object.fromEntries(Object.entries(step).map(([k, v]) => [k, typeof v === 'number' && Number.isNaN(v) ? 0 : v])) as T;
}
