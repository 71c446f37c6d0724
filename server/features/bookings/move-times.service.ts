import { DateTime } from 'luxon';
import type { Db } from '@server/db/database';
import type { Salon } from '@shared/schemas/salon.schemas';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import type { Availability } from '@shared/schemas/online-booking.schemas';
import { freeTimes } from '../online-booking';
import { sittingStarts } from './change-booking.repository';
import { dayGapProblem, movableSitting } from './move-booking.service';

export interface DeskMoveTimesRequest {
  sitting: number;
  stylistId?: string;
  /** The first local date to look from; by default the first date the sitting's neighbours allow (or today). */
  from?: string;
}

/**
 * The first local date sitting `index` may move to: the day after-previous range counted from the sitting before
 * it, and back from the sitting after it. Searching from there keeps the three weeks of free times useful.
 */
function firstAllowedDate(plan: StepPlan, starts: Date[], index: number, zone: string): string | undefined {
  const day = (d: Date) => DateTime.fromJSDate(d, { zone }).startOf('day');
  const bounds: DateTime[] = [];
  // starts holds one start per sitting of the plan, and index is one of them (movableSitting checked it).
  if (index > 0) bounds.push(day(starts[index - 1]!).plus({ days: plan.sittings[index]!.daysAfterPrevious?.min ?? 0 }));
  if (index + 1 < starts.length) bounds.push(day(starts[index + 1]!).minus({ days: plan.sittings[index + 1]!.daysAfterPrevious?.max ?? 0 }));
  return bounds.length ? DateTime.max(...bounds)!.toISODate()! : undefined;
}

/**
 * Free start times to move one sitting of a booking to, for the desk: the same free-times search as a client's own
 * move (the engine against the book without this booking), for this sitting's steps and the chosen stylist, less
 * the times that would break the days between sittings. Each time is one the move itself accepts.
 */
export async function deskMoveTimes(db: Db, salon: Salon, bookingId: string, req: DeskMoveTimesRequest, now: Date): Promise<Availability> {
  const { booking, plan, one, stylistId, skill } = await movableSitting(db, salon, bookingId, req.sitting, req.stylistId);
  const starts = await sittingStarts(db, bookingId);
  const index = req.sitting - 1;
  const from = req.from ?? firstAllowedDate(plan, starts, index, salon.timeZone);
  const salonRow = { id: salon.id, time_zone: salon.timeZone, granularity_minutes: salon.granularityMinutes };
  const times = await freeTimes(db, salonRow, { skill, stepPlan: one }, stylistId, from, now, bookingId);
  // Where it is now, with the same stylist, is no move at all (the search leaves the booking out, so finds it free).
  const current = (t: { start: string }) => stylistId === booking.stylistId && Date.parse(t.start) === starts[index]!.getTime();
  return { ...times, times: times.times.filter((t) => !current(t) && dayGapProblem(plan, starts, index, new Date(t.start), salon.timeZone) === null) };
}
