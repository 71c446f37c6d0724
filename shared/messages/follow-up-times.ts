/**
 * When a follow-up rule sends, from an RRULE (RFC 5545) anchored on the end of a booking's last sitting.
 *
 * rrule computes on "floating" dates (a Date whose UTC fields are the wall clock), so the anchor is handed
 * over as salon wall time and each occurrence is read back in the salon's zone: "6 weeks later" keeps the
 * same local time of day across a daylight-saving change.
 */
import { rrule as rr } from '../engine/rrule-package';
import { DateTime } from 'luxon';

/** No rule sends more than this many follow-ups for one booking, and none later than two years on. */
export const MAX_FOLLOW_UPS = 6;
const HORIZON_DAYS = 730;
/** Parts a follow-up rule may not carry: the anchor is always the sitting's end. */
const FORBIDDEN = /(^|;)(DTSTART|TZID)=/i;

/** Why the text is not a usable rule, or null when it is. */
export function followUpRuleProblem(text: string): string | null {
  const rule = text.trim();
  if (!/^(RRULE:)?FREQ=/i.test(rule)) return 'Start the rule with FREQ=, e.g. FREQ=WEEKLY;INTERVAL=6;COUNT=1';
  if (FORBIDDEN.test(rule)) return 'Leave out DTSTART and TZID: the rule starts when the sitting ends';
  if (!/(^|;)(COUNT|UNTIL)=/i.test(rule)) return 'Add COUNT= (how many times) or UNTIL= so the rule ends';
  try {
    const options = rr.RRule.parseString(rule.replace(/^RRULE:/i, ''));
    if (options.freq === undefined) return 'FREQ is missing or unknown';
    if ((options.interval ?? 1) < 1 || (options.count ?? 1) < 1) return 'INTERVAL and COUNT must be at least 1';
    new rr.RRule({ ...options, dtstart: new Date(0) }).all((_, i) => i < 1);
  } catch (e) {
    return `Not a valid RRULE: ${(e as Error).message}`;
  }
  return null;
}

/** The instants a rule sends for a sitting that ends at `anchor`, in the salon's zone (first occurrence = the anchor itself is skipped). */
export function followUpTimes(text: string, anchor: Date, zone: string): Date[] {
  const wall = DateTime.fromJSDate(anchor, { zone });
  const floating = new Date(Date.UTC(wall.year, wall.month - 1, wall.day, wall.hour, wall.minute));
  const options = rr.RRule.parseString(text.trim().replace(/^RRULE:/i, ''));
  // COUNT counts sends, not the anchor: RFC 5545 counts DTSTART as the first instance, so add one for it.
  if (options.count) options.count += 1;
  const rule = new rr.RRule({ ...options, dtstart: floating });
  const end = new Date(floating.getTime() + HORIZON_DAYS * 86_400_000);
  const out: Date[] = [];
  rule.all((d, i) => {
    if (d > end || out.length >= MAX_FOLLOW_UPS) return false;
    if (i > 0 || d.getTime() !== floating.getTime()) {
      out.push(
        DateTime.fromObject(
          { year: d.getUTCFullYear(), month: d.getUTCMonth() + 1, day: d.getUTCDate(), hour: d.getUTCHours(), minute: d.getUTCMinutes() },
          { zone },
        ).toJSDate(),
      );
    }
    return true;
  });
  return out;
}
