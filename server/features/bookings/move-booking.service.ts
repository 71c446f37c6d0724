import { DateTime } from 'luxon';
import type { Kysely } from 'kysely';
import type { Db } from '@server/db/database';
import type { Database } from '@server/db/schema';
import type { Salon } from '@shared/schemas/salon.schemas';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { takenMeanwhile } from './sitting-change';
import { AppError, notFound } from '@server/lib/app-error';
import { findService } from '../services';
import { lockStylists } from '../planning';
import { exactPlan } from '../planning';
import { assertSkinTestAllows } from '../skin-tests';
import { bookingSnapshot } from './booking-snapshot.repository';
import { auditBookingChange } from './booking-audit.service';
import { replaceSitting, setStylist, sittingChair, sittingStarts, sittingStatus } from './change-booking.repository';
import { preferredChair } from './preferred-chair';
import { listStylists } from './salon-resources.repository';
import { replanBookingMessages } from '../messages';
import { withdrawStaleOffers } from '../windows';

export interface MoveRequest {
  bookingId: string;
  sitting: number;
  start: Date;
  stylistId?: string;
  /** The chair to keep when it is free then (an undo puts a sitting back in its old chair); by default the sitting's own. */
  chairId?: string;
  /** The desk may move a booking that rests on an unread skin test; a client moving their own may not. */
  allowWaitingOnTest?: boolean;
  /**
   * What the client is told: the change notice (by default), or nothing here when the move is a late start the
   * caller tells them of in its own words ("running about 15 minutes late"); their reminders follow the move either way.
   */
  notice?: 'change' | 'running_late';
  /** Why, in the audit entry's words (e.g. "running late: started 15 min late"). */
  auditNote?: string;
}

const MOVABLE = ['held', 'booked'];

/**
 * A booking's sitting as it may be moved: refused (with the reason) for a booking that is not held or booked, a
 * sitting it does not have, or another stylist for a booking of several sittings. The free times for a move and
 * the move itself check the same way.
 */
export async function movableSitting(db: Db, salon: Pick<Salon, 'id'>, bookingId: string, sitting: number, wantedStylistId: string | undefined) {
  const before = await bookingSnapshot(db, bookingId);
  if (!before || before.booking.salonId !== salon.id) throw notFound('That booking');
  const { booking } = before;
  if (!MOVABLE.includes(booking.status)) throw new AppError('NOT_BOOKABLE', 409, `A ${booking.status.replace('_', ' ')} booking cannot be moved.`);
  const plan = booking.stepPlan;
  const moving = plan.sittings[sitting - 1];
  if (!moving) {
    throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { sitting: `This booking has ${plan.sittings.length} sitting(s).` });
  }
  // A sitting that has been run keeps its actual times: only one still booked moves.
  const status = await sittingStatus(db, bookingId, sitting);
  if (status && status !== 'booked')
    throw new AppError('CONFLICT', 409, `Sitting ${sitting} has been run on its day (${status.replace('_', ' ')}): it cannot be moved.`);
  const stylistId = wantedStylistId ?? booking.stylistId;
  if (stylistId !== booking.stylistId && plan.sittings.length > 1) {
    throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', {
      stylistId: 'All sittings stay with one stylist; move each sitting without changing the stylist.',
    });
  }
  const [service, stylists] = await Promise.all([findService(db, salon.id, booking.serviceId), listStylists(db, salon.id)]);
  const stylist = stylists.find((s) => s.id === stylistId);
  // Asked plainly here, or the engine's answer would blame the hours for a stylist who cannot do the work.
  if (stylistId !== booking.stylistId && !stylist)
    throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { stylistId: 'No such stylist in this salon.' });
  if (stylistId !== booking.stylistId && service && !stylist?.skills.includes(service.skill)) {
    throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', {
      stylistId: `${stylist?.name} does not have the "${service.skill}" skill this service needs.`,
    });
  }
  // The sitting alone is planned: the other sittings stay where they are.
  const one: StepPlan = { sittings: [{ steps: moving.steps }] };
  const skill = service?.skill ?? stylist?.skills[0] ?? '';
  return { before, booking, plan, one, stylistId, service, skill };
}

/** Moves one sitting (re-planned by the engine against the current book) and records the change. */
export async function moveSitting(db: Kysely<Database>, salon: Salon, actorUserId: string, req: MoveRequest, now: Date): Promise<void> {
  await db.transaction().execute((trx) => moveSittingIn(trx, salon, actorUserId, req, now));
}

/** The move inside the caller's transaction (a re-plan's fix is checked and made in one). */
export async function moveSittingIn(trx: Db, salon: Salon, actorUserId: string, req: MoveRequest, now: Date): Promise<void> {
  const { before, booking, plan, one, stylistId, service, skill } = await movableSitting(trx, salon, req.bookingId, req.sitting, req.stylistId);
  if (req.start < now) throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { start: 'That time has already passed.' });
  await lockStylists(trx, [booking.stylistId, stylistId]);

  const starts = await sittingStarts(trx, req.bookingId);
  const gapProblem = dayGapProblem(plan, starts, req.sitting - 1, req.start, salon.timeZone);
  if (gapProblem) throw new AppError('CONFLICT', 409, gapProblem);
  // A later date may fall outside the skin test's validity: the whole booking is checked with the moved sitting.
  if (booking.clientId) {
    const moved = starts.map((s, i) => (i === req.sitting - 1 ? req.start : s));
    await assertSkinTestAllows(
      trx,
      salon,
      { clientId: booking.clientId, plan, serviceAsks: service?.needsSkinTest ?? false, starts: moved, atDesk: req.allowWaitingOnTest ?? false },
      now,
    );
  }

  const answers = await exactPlan(trx, salon, [{ skill, stylistId, plan: one, start: req.start }], req.bookingId);
  const result = answers[0]!; // one answer per placement
  if ('reason' in result) throw new AppError('CONFLICT', 409, result.reason);
  const placed = result.plan.sittings[0]!; // one sitting asked, one placed
  const chair = await preferredChair(trx, salon.id, placed, req.chairId ?? (await sittingChair(trx, req.bookingId, req.sitting)), req.bookingId);
  try {
    if (stylistId !== booking.stylistId) await setStylist(trx, req.bookingId, stylistId);
    await replaceSitting(
      trx,
      req.bookingId,
      req.sitting,
      chair,
      stylistId,
      placed.steps.map((st) => ({
        kind: st.kind,
        label: st.label,
        start: new Date(st.start),
        end: new Date(st.end),
        basinId: st.basin,
      })),
    );
  } catch (err) {
    takenMeanwhile(err, 'Someone took that time a moment ago.');
  }
  const action = `moved sitting ${req.sitting}${req.auditNote ? ` (${req.auditNote})` : ''}`;
  await auditBookingChange(trx, { salonId: salon.id, actorUserId, bookingId: req.bookingId, action, before: before.audit });
  // Old reminders dropped, new ones planned; the change notice unless the caller tells the client itself.
  await replanBookingMessages(trx, req.bookingId, now, req.notice === 'running_late' ? 'moved_quietly' : 'moved');
  await withdrawStaleOffers(trx, salon, stylistId, { from: new Date(placed.steps[0]!.start), to: new Date(placed.steps[placed.steps.length - 1]!.end) }, now);
}

/** Why moving sitting `index` to `newStart` breaks a sitting's days-after-previous range with its neighbours, or null. */
export function dayGapProblem(plan: StepPlan, starts: Date[], index: number, newStart: Date, zone: string): string | null {
  const day = (d: Date) => DateTime.fromJSDate(d, { zone }).startOf('day');
  const moved = starts.map((s, i) => (i === index ? newStart : s));
  // starts holds one start per sitting of the plan, so moved[k - 1] is in range. The plan schema asks every later
  // sitting for its days after the previous one; a plan stored before that rule has no range to break.
  for (let k = 1; k < moved.length; k++) {
    const gap = plan.sittings[k]?.daysAfterPrevious;
    if (!gap) continue;
    const days = Math.round(day(moved[k]!).diff(day(moved[k - 1]!), 'days').days);
    if (days < gap.min || days > gap.max) return `Sitting ${k + 1} must be ${gap.min}–${gap.max} days after sitting ${k}; this move makes it ${days}.`;
  }
  return null;
}
