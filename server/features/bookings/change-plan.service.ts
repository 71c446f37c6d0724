import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Salon } from '@shared/schemas/salon.schemas';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { takenMeanwhile } from './sitting-change';
import { AppError, notFound } from '@server/lib/app-error';
import { findService } from '../services';
import { lockStylists } from '../planning';
import { exactPlan } from '../planning';
import { assertWithinProcessingLimits } from '../planning';
import { assertSkinTestAllows } from '../skin-tests';
import { replanBookingMessages } from '../messages';
import { bookingSnapshot } from './booking-snapshot.repository';
import { auditBookingChange } from './booking-audit.service';
import { replaceSitting, setStepPlan, sittingStarts } from './change-booking.repository';

/**
 * Replaces a booking's step plan, each sitting kept at its start (e.g. oxidative colour changed to a direct dye
 * when a skin test reacted): the engine places every sitting again against the current book, the skin-test,
 * age and processing rules are checked as at any desk door, and the change is audited and its messages replanned.
 */
export async function changePlan(db: Kysely<Database>, salon: Salon, actorUserId: string, bookingId: string, plan: StepPlan, now: Date): Promise<void> {
  assertWithinProcessingLimits(plan, salon.processingLimits);
  await db.transaction().execute(async (trx) => {
    const before = await bookingSnapshot(trx, bookingId);
    if (!before || before.booking.salonId !== salon.id) throw notFound('That booking');
    const { booking } = before;
    if (booking.status !== 'booked') throw new AppError('NOT_BOOKABLE', 409, `A ${booking.status.replace('_', ' ')} booking's plan cannot be changed.`);
    const starts = await sittingStarts(trx, bookingId);
    if (plan.sittings.length !== starts.length) {
      throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', {
        stepPlan: `Keep ${starts.length} sitting(s); to change the sittings, cancel and book again.`,
      });
    }
    if (starts.some((s) => s < now)) throw new AppError('CONFLICT', 409, 'A sitting has already started; change what is left at the chair.');
    await lockStylists(trx, [booking.stylistId]);
    const service = await findService(trx, salon.id, booking.serviceId);
    if (booking.clientId) {
      await assertSkinTestAllows(trx, salon, { clientId: booking.clientId, plan, serviceAsks: service?.needsSkinTest ?? false, starts, atDesk: true }, now);
    }
    // Each sitting alone at its start, against the book without this booking (so one sitting never meets another).
    const placements = starts.map((start, i) => ({
      skill: service?.skill ?? 'colour',
      stylistId: booking.stylistId,
      plan: { sittings: [{ steps: plan.sittings[i]!.steps }] }, // as many sittings as starts (checked above)
      start,
    }));
    const results = await exactPlan(trx, salon, placements, bookingId);
    for (const [i, result] of results.entries()) {
      if ('reason' in result) throw new AppError('CONFLICT', 409, `Sitting ${i + 1}: ${result.reason}`);
      const placed = result.plan.sittings[0]!; // one sitting asked, one placed
      try {
        await replaceSitting(
          trx,
          bookingId,
          i + 1,
          placed.chair,
          booking.stylistId,
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
    }
    await setStepPlan(trx, bookingId, plan);
    await auditBookingChange(trx, {
      salonId: salon.id,
      actorUserId,
      bookingId,
      action: 'changed the step plan',
      before: { ...before.audit, steps: stepNames(booking.stepPlan) },
      alsoAfter: { steps: stepNames(plan) },
    });
    await replanBookingMessages(trx, bookingId, now, 'skin_test'); // reminders come back when the new plan is allowed
  });
}

const stepNames = (plan: StepPlan) => plan.sittings.map((s) => s.steps.map((st) => `${st.label} (${st.product})`).join(', '));
