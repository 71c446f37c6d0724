import { useId, useState } from 'react';
import { useFormContext } from 'react-hook-form';
import { composeWeeklyRule, nextDates, readWeeklyRule, WEEKDAY_CODES, type WeeklyRule } from '@shared/engine/weekly-rule';
import { Button } from '@client/components/ui/button';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { TextField } from '@client/components/ui/text-field';
import { describeHoursRule } from '@shared/engine/describe-hours';
import { fieldError } from '@client/lib/form-errors';
import { todayIn } from '@client/lib/time';
import { formatDate } from '@shared/format/date-time';
import { zonelessFormat } from '@shared/format/locale';

const dayNames: Record<(typeof WEEKDAY_CODES)[number], string> = { MO: 'Mon', TU: 'Tue', WE: 'Wed', TH: 'Thu', FR: 'Fri', SA: 'Sat', SU: 'Sun' };
const shortDate = (date: string) => formatDate(date, zonelessFormat, { width: 'short' });

/** `sharedDays`: weekdays this line has that another line has too (both lines' hours count on them). */
type Props = { path: string; number: number; timeZone: string; sharedDays?: readonly string[]; onRemove?: () => void };

/**
 * One line of hours: which days (weekdays, every other week, closed dates) and from when to when.
 * The day picker writes the RFC 5545 text below it, which can also be edited by hand; the preview lists
 * the next dates the text falls on.
 */
export function WeeklyRuleLine({ path, number, timeZone, sharedDays = [], onRemove }: Props) {
  const { register, watch, setValue, formState } = useFormContext();
  const text: string = watch(`${path}.rrule`) ?? '';
  const rule = readWeeklyRule(text);
  const [closedDraft, setClosedDraft] = useState('');
  const closedId = useId();
  const error = (field: string) => fieldError(formState.errors, `${path}.${field}`);
  const write = (next: WeeklyRule) =>
    setValue(`${path}.rrule`, next.weekdays.length ? composeWeeklyRule(next) : '', { shouldDirty: true, shouldValidate: formState.isSubmitted });
  let preview: string[] = [];
  try {
    preview = text ? nextDates(text, timeZone, todayIn(timeZone), 6) : [];
  } catch {
    preview = []; // the rule's own error says why
  }
  const blank: WeeklyRule = { weekdays: [], everyOtherWeek: false, startsOn: null, closedDates: [] };
  const shown = rule ?? (text ? null : blank);
  return (
    <fieldset className="flex flex-col gap-3 rounded-xl p-4 ring-1 ring-ink/15">
      <legend className="px-1 font-bold">Hours line {number}</legend>
      {shown ? (
        <>
          <div role="group" aria-label={`Days of hours line ${number}`} className="flex flex-wrap gap-2">
            {WEEKDAY_CODES.map((code) => {
              const on = shown.weekdays.includes(code);
              return (
                <button
                  key={code}
                  type="button"
                  aria-pressed={on}
                  onClick={() => write({ ...shown, weekdays: on ? shown.weekdays.filter((d) => d !== code) : [...shown.weekdays, code] })}
                  className="min-h-11 min-w-14 rounded-lg border border-edge bg-white px-3 hover:border-ink aria-pressed:border-2 aria-pressed:border-oxide aria-pressed:bg-linen aria-pressed:font-bold"
                >
                  {dayNames[code]}
                </button>
              );
            })}
          </div>
          <div className="flex flex-wrap items-end gap-4">
            <label className="flex min-h-11 items-center gap-2">
              <input
                type="checkbox"
                className="size-5"
                checked={shown.everyOtherWeek}
                onChange={(e) => write({ ...shown, everyOtherWeek: e.target.checked, startsOn: shown.startsOn ?? todayIn(timeZone) })}
              />
              Every other week
            </label>
            {shown.everyOtherWeek && (
              <TextField
                label="Counting from the week of"
                type="date"
                value={shown.startsOn ?? ''}
                onChange={(e) => write({ ...shown, startsOn: e.target.value || null })}
              />
            )}
          </div>
          <div className="flex flex-wrap items-end gap-3">
            <TextField
              id={closedId}
              label="Closed on (holiday or exception)"
              type="date"
              value={closedDraft}
              onChange={(e) => setClosedDraft(e.target.value)}
            />
            <Button
              variant="secondary"
              disabled={!closedDraft}
              onClick={() => {
                write({ ...shown, closedDates: [...shown.closedDates, closedDraft] });
                setClosedDraft('');
              }}
            >
              Add closed date
            </Button>
          </div>
          {shown.closedDates.length > 0 && (
            <ul aria-label={`Closed dates of hours line ${number}`} className="flex flex-wrap gap-2">
              {shown.closedDates.map((date) => (
                <li key={date} className="flex items-center gap-1 rounded-lg bg-linen px-3 py-1">
                  {shortDate(date)}
                  <Button
                    variant="quiet"
                    aria-label={`Open again on ${shortDate(date)}`}
                    onClick={() => write({ ...shown, closedDates: shown.closedDates.filter((d) => d !== date) })}
                  >
                    ✕
                  </Button>
                </li>
              ))}
            </ul>
          )}
        </>
      ) : (
        <p className="text-sm">This rule uses more than weekdays; edit its text below.</p>
      )}
      <div className="flex flex-wrap gap-3">
        <TextField
          label="Opens"
          aria-label={`Opening time of hours line ${number}`}
          type="time"
          className="w-36"
          error={error('start')}
          {...register(`${path}.start`)}
        />
        <TextField
          label="Closes"
          aria-label={`Closing time of hours line ${number}`}
          type="time"
          className="w-36"
          error={error('end')}
          {...register(`${path}.end`)}
        />
      </div>
      {/* The rule's text is for the few patterns the picker cannot make: tucked away unless this line needs it. */}
      <details open={!shown || Boolean(error('rrule'))} className="text-sm">
        <summary className="min-h-11 cursor-pointer py-2 font-bold">For experts: the days as calendar text</summary>
        <TextAreaField
          label="Days as a calendar rule"
          aria-label={`Rule of hours line ${number}`}
          hint="Written by the day picker, one line each. Only for patterns the picker cannot make, edit it as iCalendar recurrence text (RFC 5545), e.g. FREQ=MONTHLY;BYDAY=1SA"
          rows={Math.max(1, text.split('\n').length)}
          error={error('rrule')}
          {...register(`${path}.rrule`)}
        />
      </details>
      <div aria-live="polite" className="flex flex-col gap-1 text-sm">
        {sharedDays.length > 0 && (
          <p>
            <span className="font-bold">Also in another line:</span> {sharedDays.map((d) => dayNames[d as keyof typeof dayNames] ?? d).join(', ')}. Both lines'
            hours count on {sharedDays.length === 1 ? 'that day' : 'those days'}.
          </p>
        )}
        <p>
          <span className="font-bold">Reads as:</span> {text ? describeHoursRule(text, todayIn(timeZone)) : 'no days yet'}
        </p>
        <p>
          <span className="font-bold">Next dates:</span> {preview.length ? preview.map(shortDate).join(' · ') : 'none in the coming year'}
        </p>
      </div>
      {onRemove && (
        <div>
          <Button variant="quiet" onClick={onRemove}>
            Remove hours line {number}
          </Button>
        </div>
      )}
    </fieldset>
  );
}
