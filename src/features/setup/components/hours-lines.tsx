import { useFieldArray, useFormContext } from 'react-hook-form';
import { readWeeklyRule, WEEKDAY_CODES } from '@shared/engine/weekly-rule';
import { Button } from '@client/components/ui/button';
import { fieldError } from '@client/lib/form-errors';
import { WeeklyRuleLine } from './weekly-rule-line';

type Props = { name: string; timeZone: string };

/** Opening or working hours as lines of days and times, each with its own preview. */
export function HoursLines({ name, timeZone }: Props) {
  const { control, formState, watch } = useFormContext();
  const lines = useFieldArray({ control, name });
  const error = fieldError(formState.errors, name);
  const values: { rrule?: string }[] = watch(name) ?? [];
  const daysOf = (i: number) => readWeeklyRule(values[i]?.rrule ?? '')?.weekdays ?? [];
  // A new line starts on a day no other line has yet (none when every day has one), so it never doubles a day unasked.
  const freeDay = WEEKDAY_CODES.find((code) => !values.some((_, i) => daysOf(i).includes(code)));
  return (
    <div className="flex flex-col gap-3">
      {lines.fields.map((field, i) => (
        <WeeklyRuleLine
          key={field.id}
          path={`${name}.${i}`}
          number={i + 1}
          timeZone={timeZone}
          sharedDays={daysOf(i).filter((day) => values.some((_, j) => j !== i && daysOf(j).includes(day)))}
          onRemove={() => lines.remove(i)}
        />
      ))}
      {error && <p className="text-sm font-bold text-brick">{error}</p>}
      <div>
        <Button variant="secondary" onClick={() => lines.append({ rrule: freeDay ? `FREQ=WEEKLY;BYDAY=${freeDay}` : '', start: '09:00', end: '17:00' })}>
          Add an hours line
        </Button>
      </div>
    </div>
  );
}
