import { DateTime } from 'luxon';
import type { Kysely } from 'kysely';
import type { Database } from '../../db/schema';
import type { Salon } from '../../../shared/schemas/salon.schemas';
import type { StepPlan } from '../../../shared/schemas/step-plan.schemas';
import { AppError, notFound } from '../../lib/app-error';
import { findService } from '../services/services.repository';
import { lockStylists } from '../planning/stylist-lock';
import { loadSalonCalendars } from '../planning/salon-calendars.repository';
import { horizonFor } from '../planning/engine-request';
import { planExactlyAt } from '../planning/plan-at';
import { writeAudit } from '../audit/audit.repository';
import { assertSkinTestAllows } from '../skin-tests/skin-test-check.service';
import { bookingSnapshot } from './booking-snapshot.repository';
import { replaceSitting, setStylist, sittingStarts } from './change-booking.repository';
import { replanBookingMessages } from '../messages/plan-messages.service';
import { withdrawStaleOffers } from '../windows/offer-withdrawal.service';

export interface MoveRequest {
  bookingId: string;
  sitting: number;
  start: Date;
  stylistId?: string;
  /** The desk may move a booking that rests on an unread skin test; a client moving their own may not. */
  allowWaitingOnTest?: boolean;
}

const MOVABLE = ['held', 'booked'];

/** Moves one sitting (re-planned by the engine against the current book) and records the change. */
export async function moveSitting(db: Kysely<Database>, salon: Salon, actorUserId: string, req: MoveRequest, now: Date): Promise<void> {
  await db.transaction().execute(async (trx) => {
    const before = await bookingSnapshot(trx, req.bookingId);
    if (!before || before.row.salon_id !== salon.id) throw notFound('That booking');
    const { row } = before;
    if (!MOVABLE.includes(row.status)) throw new AppError('NOT_BOOKABLE', 409, `A ${row.status.replace('_', ' ')} booking cannot be moved.`);
    const plan = row.step_plan as StepPlan;
    if (req.sitting > plan.sittings.length) {
      throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { sitting: `This booking has ${plan.sittings.length} sitting(s).` });
    }
    const stylistId = req.stylistId ?? row.stylist_id;
    if (stylistId !== row.stylist_id && plan.sittings.length > 1) {
      throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { stylistId: 'All sittings stay with one stylist; move each sitting without changing the stylist.' });
    }
    if (req.start < now) throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { start: 'That time has already passed.' });
    await lockStylists(trx, [row.stylist_id, stylistId]);

    const starts = await sittingStarts(trx, req.bookingId);
    assertDayGaps(plan, starts, req.sitting - 1, req.start, salon.timeZone);
    const service = await findService(trx, salon.id, row.service_id);
    // A later date may fall outside the skin test's validity: the whole booking is checked with the moved sitting.
    if (row.client_id) {
      const moved = starts.map((s, i) => (i === req.sitting - 1 ? req.start : s));
      await assertSkinTestAllows(trx, salon, { clientId: row.client_id, plan, serviceAsks: service?.needsSkinTest ?? false, starts: moved, atDesk: req.allowWaitingOnTest ?? false }, now);
    }

    const one: StepPlan = { sittings: [{ steps: plan.sittings[req.sitting - 1].steps }] };
    const date = DateTime.fromJSDate(req.start, { zone: salon.timeZone }).toISODate()!;
    const calendars = await loadSalonCalendars(trx, salon.id, horizonFor(date, one, 1), req.bookingId);
    const skill = service?.skill ?? calendars.stylists.find((s) => s.id === stylistId)?.skills[0] ?? '';
    const result = planExactlyAt(calendars, { skill, stylistId, plan: one, start: req.start });
    if ('reason' in result) throw new AppError('CONFLICT', 409, result.reason);
    const placed = result.plan.sittings[0];
    try {
      if (stylistId !== row.stylist_id) await setStylist(trx, req.bookingId, stylistId);
      await replaceSitting(trx, req.bookingId, req.sitting, placed.chair, stylistId, placed.steps.map((st, j) => ({
        kind: st.kind, label: one.sittings[0].steps[j].label, start: new Date(st.start), end: new Date(st.end), basinId: st.basin ?? null,
      })));
    } catch (err) {
      if ((err as { code?: string }).code === '23P01') throw new AppError('CONFLICT', 409, 'Someone took that time a moment ago.');
      throw err;
    }
    const after = await bookingSnapshot(trx, req.bookingId);
    await writeAudit(trx, { salonId: salon.id, actorUserId, entity: 'booking', entityId: req.bookingId, action: `moved sitting ${req.sitting}`, before: before.audit, after: after?.audit });
    await replanBookingMessages(trx, req.bookingId, now, 'moved'); // old reminders dropped, new ones planned
    await withdrawStaleOffers(trx, salon, stylistId, { from: new Date(placed.steps[0].start), to: new Date(placed.steps[placed.steps.length - 1].end) }, now);
  });
}

/** The moved sitting must keep each sitting's days-after-previous range with its neighbours. */
function assertDayGaps(plan: StepPlan, starts: Date[], index: number, newStart: Date, zone: string) {
  const day = (d: Date) => DateTime.fromJSDate(d, { zone }).startOf('day');
  const moved = starts.map((s, i) => (i === index ? newStart : s));
  for (let k = 1; k < moved.length; k++) {
    const gap = plan.sittings[k].daysAfterPrevious!;
    const days = Math.round(day(moved[k]).diff(day(moved[k - 1]), 'days').days);
    if (days < gap.min || days > gap.max) {
      throw new AppError('CONFLICT', 409, `Sitting ${k + 1} must be ${gap.min}–${gap.max} days after sitting ${k}; this move makes it ${days}.`);
    }
  }
}
