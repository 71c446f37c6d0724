/**
 * A follow-up rule's timing in plain words and back: "Send 1 time, 6 weeks after the last sitting" is the RFC 5545
 * rule FREQ=WEEKLY;INTERVAL=6;COUNT=1. Only this simple shape (how often, how many times) has words here; any other
 * rule is kept as its calendar text for the experts who wrote it.
 */

export const FOLLOW_UP_UNITS = { DAILY: ['day', 'days'], WEEKLY: ['week', 'weeks'], MONTHLY: ['month', 'months'], YEARLY: ['year', 'years'] } as const;
export type FollowUpUnit = keyof typeof FOLLOW_UP_UNITS;

/** Every `every` units after the last sitting, `times` times. */
export type FollowUpTiming = { every: number; unit: FollowUpUnit; times: number };

/** The timing of a rule of the simple shape, or null for any other rule. */
export function readFollowUpTiming(text: string): FollowUpTiming | null {
  const parts = new Map(
    text
      .trim()
      .replace(/^RRULE:/i, '')
      .toUpperCase()
      .split(';')
      .filter(Boolean)
      .map((p) => p.split('=') as [string, string | undefined]),
  );
  const unit = parts.get('FREQ');
  const every = Number(parts.get('INTERVAL') ?? '1');
  const times = Number(parts.get('COUNT'));
  const known = [...parts.keys()].every((k) => k === 'FREQ' || k === 'INTERVAL' || k === 'COUNT');
  if (!known || !unit || !(unit in FOLLOW_UP_UNITS) || !Number.isInteger(every) || every < 1 || !Number.isInteger(times) || times < 1) return null;
  return { every, unit: unit as FollowUpUnit, times };
}

/** The rule text of a timing: FREQ=WEEKLY;INTERVAL=6;COUNT=1. */
export function composeFollowUpTiming({ every, unit, times }: FollowUpTiming): string {
  return `FREQ=${unit};INTERVAL=${every};COUNT=${times}`;
}

/** "once, 6 weeks after the last sitting", "3 times, every 4 weeks after the last sitting"; null for other rules. */
export function describeFollowUpRule(text: string): string | null {
  const timing = readFollowUpTiming(text);
  if (!timing) return null;
  const [one, many] = FOLLOW_UP_UNITS[timing.unit];
  if (timing.times === 1) return `once, ${timing.every} ${timing.every === 1 ? one : many} after the last sitting`;
  return `${timing.times} times, every ${timing.every === 1 ? one : `${timing.every} ${many}`} after the last sitting`;
}
