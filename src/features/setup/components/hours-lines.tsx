import { useFieldArray, useFormContext } from 'react-hook-form';
import { Button } from '@client/components/ui/button';
import { fieldError } from '@client/lib/form-errors';
import { WeeklyRuleLine } from './weekly-rule-line';

type Props = { name: string; timeZone: string };

/** Opening or working hours as lines of days and times, each with its own preview. */
export function HoursLines({ name, timeZone }: Props) {
  const { control, formState } = useFormContext();
  const lines = useFieldArray({ control, name });
  const error = fieldError(formState.errors, name);
  return (
    <div className="flex flex-col gap-3">
      {lines.fields.map((field, i) => (
        <WeeklyRuleLine key={field.id} path={`${name}.${i}`} number={i + 1} timeZone={timeZone} onRemove={() => lines.remove(i)} />
      ))}
      {error && <p className="text-sm font-bold text-brick">{error}</p>}
      <div>
        <Button variant="secondary" onClick={() => lines.append({ rrule: 'FREQ=WEEKLY;BYDAY=TU', start: '09:00', end: '17:00' })}>
          Add an hours line
        </Button>
      </div>
    </div>
  );
}
