import { DateTime } from 'luxon';
import type { ServiceRequest, StartStretch } from '@shared/engine/engine';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import type { BookingOption } from '@shared/schemas/booking.schemas';
import { MAX_HORIZON_DAYS } from '@shared/engine/engine';
import { localDateTimeOf, shiftLocalDate } from '@shared/time/salon-time';
import { formatIso, parseLocalDateTime, zoneClock } from '@shared/engine/local-time';
import type { PlacedOption } from './placed-option';

/** Instants a sitting may start between, both included (e.g. what a client's skin test allows). */
export interface StartLimit {
  from: Date;
  to: Date;
}

/** A step's id in the engine request and back: its place in the plan, "2.1" for sitting 2, step 1. */
export const stepId = (sitting: number, step: number) => `${sitting + 1}.${step + 1}`;

/**
 * The engine's view of a step plan: the same chain, each step with its id and label (the answer returns them on the
 * placed steps), and per sitting the stretches its start may fall in (`null` or absent: anywhere).
 */
export function toEngineSittings(plan: StepPlan, zone: string, limits?: ReadonlyArray<StartLimit[] | null>): ServiceRequest['sittings'] {
  return plan.sittings.map((s, i) => {
    const limit = limits?.[i];
    return {
      ...(s.daysAfterPrevious ? { daysAfterPrevious: s.daysAfterPrevious } : {}),
      steps: s.steps.map((st, k) => {
        const tags = { id: stepId(i, k), label: st.label };
        return st.kind === 'developing'
          ? { kind: 'developing' as const, minMinutes: st.minMinutes, maxMinutes: st.maxMinutes, ...tags }
          : { kind: st.kind, minutes: st.minutes, ...tags };
      }),
      ...(limit ? { allowedStarts: limit.flatMap((l) => startStretch(l, zone) ?? []) } : {}),
    };
  });
}

/**
 * A limit as the engine's local text, never wider than the instants (null when nothing is left): `from` rounded up
 * to the minute, `to` down. The engine reads a wall time in the hour repeated when clocks go back as its first
 * occurrence, so a `from` in the second occurrence moves on until its text reads back no earlier than the instant
 * (a `to` there reads earlier, which only narrows the stretch).
 */
function startStretch(limit: StartLimit, zone: string): StartStretch | null {
  const first = Math.ceil(limit.from.getTime() / 60_000);
  const last = Math.floor(limit.to.getTime() / 60_000);
  const clockAround = (utc: number) => zoneClock(zone, Math.floor(utc / 1440) - 1, Math.floor(utc / 1440) + 2);
  const early = clockAround(first);
  const text = (utc: number, clock = early) => formatIso(utc, clock.offsetAt(utc)).slice(0, 16);
  let from = first;
  while (early.toUtc(parseLocalDateTime(text(from))!, 'reject')! < first) from++;
  return from <= last ? { from: text(from), to: text(last, clockAround(last)) } : null;
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

/** A placed option as the desk sees it: names, the steps' labels, chair time and hands-free time. */
export function toBookingOption(option: PlacedOption, names: Names, skinTest: BookingOption['skinTest']): BookingOption {
  let chairMinutes = 0;
  let handsFreeMinutes = 0;
  const sittings = option.sittings.map((s) => {
    const steps = s.steps.map((st) => {
      if (st.kind === 'developing') handsFreeMinutes += minutesBetween(st.start, st.end);
      return {
        kind: st.kind,
        label: st.label,
        start: st.start,
        end: st.end,
        basinId: st.basin,
        basinName: st.basin ? (names.basins.get(st.basin) ?? null) : null,
      };
    });
    // The engine plans every sitting with at least one step (its request schema requires one).
    const start = steps[0]!.start;
    const end = steps[steps.length - 1]!.end;
    chairMinutes += minutesBetween(start, end);
    return { chairId: s.chair, chairName: names.chairs.get(s.chair) ?? '', start, end, steps };
  });
  return { stylistId: option.stylist, stylistName: names.stylists.get(option.stylist) ?? '', sittings, chairMinutes, handsFreeMinutes, skinTest };
}
