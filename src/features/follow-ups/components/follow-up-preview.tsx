import { DateTime } from 'luxon';
import { formatDateTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { followUpRuleProblem, followUpTimes } from '@shared/messages/follow-up-times';

type Props = { rrule: string; timeZone: string; now: Date };

/** When the rule would send for a sitting ending today at 17:00 salon time (same computation as the server). */
export function FollowUpPreview({ rrule, timeZone, now }: Props) {
  const rule = rrule
    .trim()
    .replace(/^RRULE:/i, '')
    .toUpperCase();
  const problem = rule ? followUpRuleProblem(rule) : 'Enter a rule to see when it sends.';
  const anchor = DateTime.fromJSDate(now, { zone: timeZone }).set({ hour: 17, minute: 0, second: 0, millisecond: 0 });
  return (
    <div aria-live="polite" className="rounded-lg bg-linen p-3 text-sm">
      <p className="font-bold">Preview: for a sitting ending {formatDateTime(anchor.toJSDate(), formatFor(timeZone))}</p>
      {problem ? (
        <p>{problem}</p>
      ) : (
        <ol className="list-decimal pl-5">
          {followUpTimes(rule, anchor.toJSDate(), timeZone).map((d) => (
            <li key={d.toISOString()}>{formatDateTime(d, formatFor(timeZone), { zoneName: true })}</li>
          ))}
        </ol>
      )}
    </div>
  );
}
