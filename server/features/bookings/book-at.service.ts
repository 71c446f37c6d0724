import { DateTime } from 'luxon';
import type { Db } from '@server/db/database';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import type { ServiceSummary } from '@shared/schemas/service.schemas';
import type { BookingStatus } from '@shared/schemas/common.schemas';
import type { Salon } from '@shared/schemas/salon.schemas';
import { AppError } from '@server/lib/app-error';
import { exactPlan, type PlacedOption } from '../planning';
import { assertSkinTestAllows } from '../skin-tests';
import { insertBooking } from './bookings.repository';
import { preferredChair } from './preferred-chair';
import { auditBookingChange } from './booking-audit.service';
import { replanBookingMessages } from '../messages';
import { withdrawStaleOffers } from '../windows';

export interface BookAtInput {
  salon: Pick<Salon, 'id' | 'name' | 'timeZone' | 'skinTestLeadHours' | 'skinTestValidityDays' | 'skinTestFamilies' | 'granularityMinutes'>;
  /** Null for an online hold that nobody has claimed yet (the skin-test rule is checked when it is claimed). */
  clientId: string | null;
  service: ServiceSummary;
  plan: StepPlan;
  stylistId: string;
  start: Date;
  /** Chairs the person saw per sitting: used when still free for the sitting, so the booking matches the option. */
  chairIds?: string[];
  /** Book the earliest start from `start` up to this one (a window fill); without it, exactly `start`. */
  latestStart?: Date;
  actorUserId: string | null;
  now: Date;
  status?: BookingStatus;
  /**
   * Whether the booking may rest on a skin test applied and not read yet ("waiting on a skin test"): the desk may,
   * an online or link door may not. Off unless a desk door says so.
   */
  allowWaitingOnTest?: boolean;
  /** A consultation quote being booked: its price and deposit replace the service's. */
  quote?: { id: string; priceCents: number; depositCents: number };
}

/** How far ahead anything may be booked (a year: common practice for salons' books). */
export const MAX_DAYS_AHEAD = 365;

const taken = () => new AppError('CONFLICT', 409, 'Someone booked that time a moment ago. Look for times again.');

/**
 * Books the engine's plan for this stylist starting exactly at `start`, inside the caller's transaction,
 * after the caller has locked the stylist. The engine re-checks every rule against the current book; the
 * exclusion constraints are the last word on chairs, basins and hands.
 */
export async function bookAt(db: Db, input: BookAtInput): Promise<string> {
  if (input.start < input.now) {
    throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { start: 'That time has already passed.' });
  }
  if (input.start.getTime() - input.now.getTime() > MAX_DAYS_AHEAD * 86_400_000) {
    throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { start: `The book opens at most ${MAX_DAYS_AHEAD} days ahead.` });
  }
  const local = DateTime.fromJSDate(input.start, { zone: input.salon.timeZone });
  if (local.minute % input.salon.granularityMinutes !== 0 || local.second !== 0) {
    throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', {
      start: `Start times fall on the salon's ${input.salon.granularityMinutes}-minute grid.`,
    });
  }
  const found = await planOrExplain(db, input);
  const chosen = await preferredChairs(db, input.salon.id, found, input.chairIds);
  if (input.clientId) {
    const starts = found.sittings.map((s) => new Date(s.steps[0]!.start)); // the engine places no empty sitting
    await assertSkinTestAllows(
      db,
      input.salon,
      { clientId: input.clientId, plan: input.plan, serviceAsks: input.service.needsSkinTest, starts, atDesk: input.allowWaitingOnTest ?? false },
      input.now,
    );
  }
  try {
    const id = await insertBooking(db, {
      salonId: input.salon.id,
      clientId: input.clientId,
      serviceId: input.service.id,
      stylistId: input.stylistId,
      status: input.status ?? 'booked',
      stepPlan: input.plan,
      priceCents: input.quote?.priceCents ?? input.service.priceCents,
      depositCents: input.quote?.depositCents ?? input.service.depositCents,
      quoteId: input.quote?.id ?? null,
      createdBy: input.actorUserId,
      sittings: found.sittings.map((s, i) => ({
        chairId: chosen[i]!, // one chair per sitting
        steps: s.steps.map((st) => ({ kind: st.kind, label: st.label, start: new Date(st.start), end: new Date(st.end), basinId: st.basin })),
      })),
    });
    await auditBookingChange(db, {
      salonId: input.salon.id,
      actorUserId: input.actorUserId,
      bookingId: id,
      action: input.status === 'held' ? 'held online' : 'booked',
    });
    await replanBookingMessages(db, id, input.now); // confirmation and reminders, in the same transaction
    await withdrawStaleOffers(db, input.salon, input.stylistId, bookedSpan(found), input.now);
    return id;
  } catch (err) {
    if ((err as { code?: string }).code === '23P01') throw taken();
    throw err;
  }
}

/** From the first step's start to the last step's end, over every sitting. */
export function bookedSpan(plan: PlacedOption): { from: Date; to: Date } {
  const steps = plan.sittings.flatMap((s) => s.steps);
  // The engine places at least one sitting, each with at least one step.
  return { from: new Date(steps[0]!.start), to: new Date(steps[steps.length - 1]!.end) };
}

/** The engine's chair per sitting, or the one the person saw when it is still free (see preferredChair). */
function preferredChairs(db: Db, salonId: string, plan: PlacedOption, wanted: string[] | undefined): Promise<string[]> {
  return Promise.all(plan.sittings.map((s, i) => preferredChair(db, salonId, s, wanted?.[i])));
}

async function planOrExplain(db: Db, input: BookAtInput): Promise<PlacedOption> {
  const answers = await exactPlan(db, input.salon, [
    { skill: input.service.skill, stylistId: input.stylistId, plan: input.plan, start: input.start, latestStart: input.latestStart },
  ]);
  const result = answers[0]!; // one answer per placement
  if ('plan' in result) return result.plan;
  if (result.field) throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { [result.field]: result.reason });
  throw new AppError('CONFLICT', 409, result.reason);
}
