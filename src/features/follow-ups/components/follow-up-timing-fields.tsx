import { composeFollowUpTiming, FOLLOW_UP_UNITS, readFollowUpTiming, type FollowUpUnit } from '@shared/messages/follow-up-timing';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';

type Props = { rrule: string; onChange: (rrule: string) => void };

const unitOptions = (Object.keys(FOLLOW_UP_UNITS) as FollowUpUnit[]).map((unit) => ({ value: unit, label: FOLLOW_UP_UNITS[unit][1] }));
const whole = (text: string) => Math.max(1, Math.min(99, Math.trunc(Number(text)) || 1));

/**
 * When a follow-up goes, in words: after how many days, weeks, months or years, and how many times. It writes the
 * rule's calendar text; a rule these fields cannot say (written by hand) is left to that text.
 */
export function FollowUpTimingFields({ rrule, onChange }: Props) {
  const timing = readFollowUpTiming(rrule);
  if (!timing) return <p className="text-sm">This rule says more than how often and how many times: see its calendar text below.</p>;
  const set = (change: Partial<typeof timing>) => onChange(composeFollowUpTiming({ ...timing, ...change }));
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 font-bold">When it is sent</legend>
      <div className="flex flex-wrap items-end gap-3">
        <TextField
          label="After"
          type="number"
          inputMode="numeric"
          min={1}
          max={99}
          className="w-24"
          value={timing.every}
          onChange={(e) => set({ every: whole(e.target.value) })}
        />
        <SelectField label="Unit" options={unitOptions} className="w-36" value={timing.unit} onChange={(e) => set({ unit: e.target.value as FollowUpUnit })} />
        <TextField
          label="How many times"
          type="number"
          inputMode="numeric"
          min={1}
          max={6}
          className="w-36"
          value={timing.times}
          onChange={(e) => set({ times: Math.min(6, whole(e.target.value)) })}
        />
      </div>
      <p className="text-sm text-ink/80">Counted from the end of the last sitting; each next one the same span later.</p>
    </fieldset>
  );
}
