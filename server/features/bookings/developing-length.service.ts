import type { Db } from '@server/db/database';
import type { Salon } from '@shared/schemas/salon.schemas';
import { AppError, notFound } from '@server/lib/app-error';
import { auditBookingChange } from './booking-audit.service';
import { listSittingSteps, retimeSittingSteps } from './change-booking.repository';
import { changeableSitting, takenMeanwhile } from './sitting-change';

export interface DevelopingChange {
  bookingId: string;
  sittingId: string;
  stepId: string;
  /** The developing step's new length, within its least and most time. */
  minutes: number;
  /** The sitting's steps not finished yet, at their new booked times (on the grid); finished steps keep theirs. */
  steps: Array<{ id: string; start: Date; end: Date }>;
  auditNote?: string;
}

/**
 * A developing step of a sitting under way, not yet finished, given another length within its least and most time
 * (the stylist's call, offered when the day runs late): the sitting's unfinished steps are booked where they will now
 * run, so its chair, basin and the stylist's hands are held there. The client is in the chair, so no message;
 * the audit entry keeps the times as they were booked.
 */
export async function setDevelopingLength(db: Db, salon: Salon, actorUserId: string, change: DevelopingChange): Promise<void> {
  const { before, sitting } = await changeableSitting(db, salon, change.bookingId, change.sittingId);
  if (sitting.status !== 'in_progress') throw new AppError('CONFLICT', 409, `Sitting ${sitting.seq} is not under way.`);
  const steps = await listSittingSteps(db, sitting.id);
  const step = steps.find((s) => s.id === change.stepId);
  if (!step || step.kind !== 'developing') throw notFound('That developing step of the sitting');
  if (step.actualEnd) throw new AppError('CONFLICT', 409, `Step ${step.seq} “${step.label}” is finished.`);
  const planned = before.booking.stepPlan.sittings[sitting.seq - 1]?.steps[step.seq - 1];
  if (planned?.kind !== 'developing' || change.minutes < planned.minMinutes || change.minutes > planned.maxMinutes) {
    throw new AppError(
      'CONFLICT',
      409,
      `“${step.label}” develops for ${planned?.kind === 'developing' ? `${planned.minMinutes}–${planned.maxMinutes}` : 'its booked'} minutes.`,
    );
  }
  const open = steps.filter((s) => !s.actualEnd);
  const given = new Set(change.steps.map((s) => s.id));
  if (open.length !== given.size || open.some((s) => !given.has(s.id)) || change.steps.some((s) => s.end <= s.start)) {
    throw new AppError('CONFLICT', 409, 'The sitting has changed: look at the day again.');
  }
  await retimeSittingSteps(db, sitting.id, change.steps).catch((err) =>
    takenMeanwhile(err, 'The sitting’s new times meet another booking’s chair, basin or the stylist’s hands.'),
  );
  const was = Math.round((step.end.getTime() - step.start.getTime()) / 60_000);
  await auditBookingChange(db, {
    salonId: salon.id,
    actorUserId,
    bookingId: change.bookingId,
    action: `set “${step.label}” of sitting ${sitting.seq} to ${change.minutes} min${change.auditNote ? ` (${change.auditNote})` : ''}`,
    before: { ...before.audit, developing: `${was} min` },
    alsoAfter: { developing: `${change.minutes} min` },
  });
}
