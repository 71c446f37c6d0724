import type { ReactNode } from 'react';
import { formatDuration } from '@shared/format/date-time';
import { useFieldArray, useFormContext } from 'react-hook-form';
import { sittingMaxMinutes } from '@shared/schemas/step-plan.schemas';
import { DAYS_BETWEEN_SITTINGS } from '@shared/quotes/propose-quote';
import { Button } from '@client/components/ui/button';
import { stepOfKind, type StepPlanFormInput } from '@client/features/bookings/step-plan-form';
import { SittingEditor, type StepNote } from './sitting-editor';

type Props = {
  title?: string;
  /** The set-up screens may add and remove sittings; a booking keeps its service's sittings. */
  editSittings?: boolean;
  defaultOpen?: boolean;
  /** Shown above the sittings (e.g. what the notes beside the steps mean). */
  note?: ReactNode;
  /** Something to show under each step (e.g. its typical actual minutes), given the step and a way to set its minutes. */
  stepNote?: StepNote;
};

/** A step plan editor: by default the chosen service's plan, for this booking only (the menu keeps its own). */
export function StepPlanEditor({ title = 'Step plan for this booking', editSittings = false, defaultOpen = false, note, stepNote }: Props) {
  const { control, watch, setValue } = useFormContext<StepPlanFormInput>();
  const sittings = useFieldArray({ control, name: 'stepPlan.sittings' });
  const plan = watch('stepPlan');
  const longest = sittingMaxMinutes({ sittings: plan.sittings.map((s) => ({ ...s, steps: s.steps.map(numberOrZero) })) });
  return (
    <details className="rounded-xl bg-white ring-1 ring-ink/15" open={defaultOpen}>
      <summary className="cursor-pointer px-4 py-3">
        <span className="font-bold">{title}</span>{' '}
        <span className="text-ink/80">
          — {sittings.fields.length} {sittings.fields.length === 1 ? 'sitting' : 'sittings'}, up to {longest.map(formatDuration).join(' + ')}. Open to change
          steps, minutes or days between sittings.
        </span>
      </summary>
      <div className="flex flex-col gap-4 border-t border-ink/10 p-4">
        {note}
        {sittings.fields.map((field, i) => (
          <div key={field.id} className="flex flex-col gap-2">
            <SittingEditor index={i} of={sittings.fields.length} stepNote={stepNote} />
            {editSittings && sittings.fields.length > 1 && (
              <div>
                <Button
                  variant="quiet"
                  onClick={() => {
                    sittings.remove(i);
                    // The new first sitting has no "previous" to count days from.
                    if (i === 0) setValue('stepPlan.sittings.0.daysAfterPrevious', undefined);
                  }}
                >
                  Remove sitting {i + 1}
                </Button>
              </div>
            )}
          </div>
        ))}
        {editSittings && sittings.fields.length < 6 && (
          <div>
            <Button variant="secondary" onClick={() => sittings.append({ daysAfterPrevious: { ...DAYS_BETWEEN_SITTINGS }, steps: [stepOfKind('hands_on')] })}>
              Add a sitting on another day
            </Button>
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
