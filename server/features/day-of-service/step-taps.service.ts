import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { SittingRun } from '@shared/schemas/day-of-service.schemas';
import type { Salon } from '@shared/schemas/salon.schemas';
import { formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { AppError, invalidField, notFound } from '@server/lib/app-error';
import { assertColourMayStart } from './colour-start-check';
import { setSittingState, setStepActuals, type RunStep, type SittingForTap } from './sitting-run.repository';
import { runTap } from './sitting-tap.service';
import { sittingState } from './sitting-run';

const named = (s: RunStep) => `Step ${s.seq} “${s.label}”`;
const at = (salon: Salon, d: Date) => formatTime(d, formatFor(salon.timeZone));

/** A sitting whose steps can be tapped: the client has arrived and it is not finished. */
function assertUnderWay({ sitting }: SittingForTap): void {
  if (sitting.status === 'booked') {
    throw new AppError('CONFLICT', 409, `The client of sitting ${sitting.seq} is not marked arrived yet: the front desk marks the arrival first.`);
  }
  if (sitting.status === 'finished') throw new AppError('CONFLICT', 409, `Sitting ${sitting.seq} is finished.`);
}

function stepOf(found: SittingForTap, k: number): RunStep {
  const step = found.steps.find((s) => s.seq === k);
  if (!step) throw notFound(`Step ${k} of sitting ${found.sitting.seq}`);
  return step;
}

/** Starts step k now: the step before it must be finished, and a step starts once. */
export function startStep(db: Kysely<Database>, user: SessionUser, bookingId: string, seq: number, k: number, now: Date): Promise<SittingRun> {
  return runTap(db, { user, bookingId, seq, door: 'stylist_or_desk' }, now, async (trx: Db, salon, found) => {
    assertUnderWay(found);
    const step = stepOf(found, k);
    if (step.actualStart) throw new AppError('CONFLICT', 409, `${named(step)} was already started at ${at(salon, step.actualStart)}.`);
    const previous = found.steps.find((s) => s.seq === k - 1);
    if (previous && !previous.actualEnd) throw new AppError('CONFLICT', 409, `${named(previous)} is not finished yet: finish it before starting step ${k}.`);
    if (k === 1) await assertColourMayStart(trx, salon, found, now);
    await setStepActuals(trx, { ...step, actualStart: now, startedBy: user.id });
    await setSittingState(trx, found.sitting.id, { ...sittingState(found), status: 'in_progress' });
    return { action: 'start', stepSeq: k, audit: `started sitting ${seq} step ${k} “${step.label}”` };
  });
}

/** Finishes step k now; finishing the last step finishes the sitting. */
export function finishStep(db: Kysely<Database>, user: SessionUser, bookingId: string, seq: number, k: number, now: Date): Promise<SittingRun> {
  return runTap(db, { user, bookingId, seq, door: 'stylist_or_desk' }, now, async (trx: Db, salon, found) => {
    assertUnderWay(found);
    const step = stepOf(found, k);
    if (!step.actualStart) throw new AppError('CONFLICT', 409, `${named(step)} has not been started: start it before finishing it.`);
    if (step.actualEnd) throw new AppError('CONFLICT', 409, `${named(step)} was already finished at ${at(salon, step.actualEnd)}.`);
    await setStepActuals(trx, { ...step, actualEnd: now, finishedBy: user.id });
    const last = k === found.steps.length;
    if (last) await setSittingState(trx, found.sitting.id, { ...sittingState(found), status: 'finished' });
    return { action: 'finish', stepSeq: k, audit: `finished sitting ${seq} step ${k} “${step.label}”${last ? ' (sitting finished)' : ''}` };
  });
}

/**
 * Finishes a sitting whose steps are not all done (the client had to leave, a toner was not needed): only when said
 * on purpose with a reason. A step under way ends now; steps never started keep no actual times.
 */
export function finishSitting(
  db: Kysely<Database>,
  user: SessionUser,
  bookingId: string,
  seq: number,
  body: { leaveOpen: boolean; reason?: string },
  now: Date,
): Promise<SittingRun> {
  return runTap(db, { user, bookingId, seq, door: 'stylist_or_desk' }, now, async (trx: Db, _salon, found) => {
    assertUnderWay(found);
    const open = found.steps.filter((s) => !s.actualEnd);
    const list = open.map((s) => s.seq).join(', ');
    if (!body.leaveOpen) {
      throw new AppError(
        'CONFLICT',
        409,
        `Step${open.length > 1 ? 's' : ''} ${list} of sitting ${seq} ${open.length > 1 ? 'are' : 'is'} not finished: finish ${open.length > 1 ? 'them' : 'it'}, or finish the sitting leaving ${open.length > 1 ? 'them' : 'it'} open with a reason.`,
      );
    }
    const reason = body.reason?.trim() ?? '';
    if (reason.length < 3) throw invalidField('reason', 'Say why the sitting ends with steps left open');
    for (const step of open.filter((s) => s.actualStart)) await setStepActuals(trx, { ...step, actualEnd: now, finishedBy: user.id });
    await setSittingState(trx, found.sitting.id, { ...sittingState(found), status: 'finished', leftOpenReason: reason });
    return { action: 'finish_sitting', stepSeq: null, audit: `finished sitting ${seq} with step${open.length > 1 ? 's' : ''} ${list} left open: ${reason}` };
  });
}
