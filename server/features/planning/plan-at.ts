import { planOptions, type Option, type Scenario } from '@shared/engine/engine';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { toEngineSittings } from './engine-request';
import { localDateTimeOf } from '@shared/time/salon-time';
import { placedOption, type PlacedOption } from './placed-option';

export interface ExactRequest {
  skill: string;
  stylistId: string;
  plan: StepPlan;
  start: Date;
}

export type ExactAnswer = { plan: PlacedOption } | { reason: string };

/** The engine's first plan for this stylist starting at or after `start` (any time later the same day). */
function firstFrom(calendars: Scenario, req: ExactRequest): Option | undefined {
  const earliest = localDateTimeOf(req.start, calendars.timeZone);
  const { options } = planOptions({
    ...calendars,
    request: { skill: req.skill, stylist: req.stylistId, earliest, sittings: toEngineSittings(req.plan, calendars.timeZone), limit: 1, spread: 'none' },
  });
  return options[0];
}

function ask(calendars: Scenario, req: ExactRequest): Option | undefined {
  const first = firstFrom(calendars, req);
  // An engine option has at least one sitting, each with at least one step.
  return first && Date.parse(first.sittings[0]!.steps[0]!.start) === req.start.getTime() ? first : undefined;
}

/** The earliest plan starting between `req.start` and `latest` (e.g. anywhere inside a hands-free window). */
export function planBetween(calendars: Scenario, req: ExactRequest, latest: Date): ExactAnswer {
  const first = firstFrom(calendars, req);
  if (first && Date.parse(first.sittings[0]!.steps[0]!.start) <= latest.getTime()) return { plan: placedOption(first) };
  return planExactlyAt(calendars, req);
}

/**
 * The engine's plan for this stylist starting exactly at `start`, or why there is none. The reason comes from
 * asking again with less in the book: without any bookings (then it is hours or time off), with only the
 * stylist's own bookings (then their hands or client limit), else a chair or basin is taken.
 */
export function planExactlyAt(calendars: Scenario, req: ExactRequest): ExactAnswer {
  const plan = ask(calendars, req);
  if (plan) return { plan: placedOption(plan) };
  if (!ask({ ...calendars, bookings: [] }, req)) {
    return {
      reason:
        "That time is outside the salon's opening hours, the stylist's working hours, or falls in their time off (or the later sittings cannot fit their day range).",
    };
  }
  if (!ask({ ...calendars, bookings: calendars.bookings.filter((b) => b.stylist === req.stylistId) }, req)) {
    return {
      reason: 'The stylist is busy then: their hands are taken by another client, or they already have as many clients in chairs as they take at once.',
    };
  }
  return { reason: 'No chair (or basin, for the rinse) is free for the whole sitting at that time.' };
}
