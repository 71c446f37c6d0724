import { DateTime } from 'luxon';
import type { Option, ServiceRequest } from '../../../shared/engine/engine';
import type { StepPlan } from '../../../shared/schemas/step-plan.schemas';
import type { BookingOption } from '../../../shared/schemas/booking.schemas';
import { MAX_HORIZON_DAYS } from '../../../shared/engine/engine';
import { localDateTimeOf, shiftLocalDate } from '../../../shared/time/salon-time';

/** The engine's view of a step plan: the same chain without labels. */
export function toEngineSittings(plan: StepPlan): ServiceRequest['sittings'] {
  return plan.sittings.map((s) => ({
    ...(s.daysAfterPrevious ? { daysAfterPrevious: s.daysAfterPrevious } : {}),
    steps: s.steps.map((st) =>
      st.kind === 'developing' ? { kind: 'developing' as const, minMinutes: st.minMinutes, maxMinutes: st.maxMinutes } : { kind: st.kind, minutes: st.minutes },
    ),
  }));
}

/** Days the later sittings may need beyond the first one. */
const tailDays = (plan: StepPlan) => plan.sittings.reduce((t, s) => t + (s.daysAfterPrevious?.max ?? 0), 0) + 1;

/** A horizon from `from` long enough for `searchDays` of first sittings plus the later sittings, within the engine's cap. */
export function horizonFor(from: string, plan: StepPlan, searchDays: number): { from: string; to: string } {
  const days = Math.min(MAX_HORIZON_DAYS, searchDays + tailDays(plan));
  return { from, to: shiftLocalDate(from, days) };
}

/** `now` (or a later time) as the engine's local wall-clock text, rounded up onto the salon's grid. */
export function localEarliest(at: Date, zone: string, granularity: number): string {
  let t = DateTime.fromJSDate(at, { zone }).startOf('minute');
  const over = t.minute % granularity;
  if (over || t.second) t = t.plus({ minutes: over ? granularity - over : 0 });
  return localDateTimeOf(t.toJSDate(), zone);
}

export interface Names {
  stylists: Map<string, string>;
  chairs: Map<string, string>;
  basins: Map<string, string>;
}

const minutesBetween = (a: string, b: string) => Math.round((Date.parse(b) - Date.parse(a)) / 60_000);

/** An engine option as the desk sees it: names, labels from the step plan, chair time and hands-free time. */
export function toBookingOption(option: Option, plan: StepPlan, names: Names, skinTest: BookingOption['skinTest']): BookingOption {
  let chairMinutes = 0;
  let handsFreeMinutes = 0;
  const sittings = option.sittings.map((s, i) => {
    const steps = s.steps.map((st, j) => {
      if (st.kind === 'developing') handsFreeMinutes += minutesBetween(st.start, st.end);
      return {
        kind: st.kind,
        label: plan.sittings[i].steps[j].label,
        start: st.start,
        end: st.end,
        basinId: st.basin ?? null,
        basinName: st.basin ? (names.basins.get(st.basin) ?? null) : null,
      };
    });
    const start = steps[0].start;
    const end = steps[steps.length - 1].end;
    chairMinutes += minutesBetween(start, end);
    return { chairId: s.chair, chairName: names.chairs.get(s.chair) ?? '', start, end, steps };
  });
  return { stylistId: option.stylist, stylistName: names.stylists.get(option.stylist) ?? '', sittings, chairMinutes, handsFreeMinutes, skinTest };
}
