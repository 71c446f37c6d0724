import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { SittingRun, SteppedSittingRun } from '@shared/schemas/day-of-service.schemas';
import type { ReplanSummary } from '@shared/schemas/replan.schemas';
import { replanAfterTap } from '../replan';
import { findSalon } from '../salon';
import { arriveSitting } from './arrival.service';
import { markNoShow } from './no-show.service';
import { bookingOwner } from './sitting-run.repository';
import { finishSitting, finishStep, startStep } from './step-taps.service';
import { undoLastTap } from './undo-tap.service';

/*
 * The routes' doors into running the day: each reads the sitting (and step) numbers from the path and makes one tap.
 * A tap that sets an actual time also answers what it means for the rest of the stylist's day (the re-plan).
 */

type Writer = Kysely<Database>;
type SittingPath = { id: string; n: string };
type StepPath = SittingPath & { k: string };

const NOTHING: ReplanSummary = { conflicts: [], freed: [] };

/**
 * The tap's answer with its stylist's day re-planned, read after the tap is stored. The tap stands whatever the
 * re-plan does: a re-plan that fails is logged and answered as nothing to say, so a stored tap never reads as refused.
 */
async function withReplan(db: Writer, user: SessionUser, bookingId: string, now: Date, tap: Promise<SittingRun>): Promise<SteppedSittingRun> {
  const run = await tap;
  try {
    const owner = await bookingOwner(db, bookingId);
    const replan = owner ? await replanAfterTap(db, await findSalon(db, user.salonId), owner.stylistId, now) : NOTHING;
    return { ...run, replan };
  } catch (err) {
    console.error('re-plan after a tap:', err);
    return { ...run, replan: NOTHING };
  }
}

export const arriveAtDesk = (db: Writer, user: SessionUser, p: SittingPath, now: Date): Promise<SittingRun> => arriveSitting(db, user, p.id, Number(p.n), now);
export const noShowAtDesk = (db: Writer, user: SessionUser, p: SittingPath, now: Date): Promise<SittingRun> => markNoShow(db, user, p.id, Number(p.n), now);
export const startStepTap = (db: Writer, user: SessionUser, p: StepPath, now: Date) =>
  withReplan(db, user, p.id, now, startStep(db, user, p.id, Number(p.n), Number(p.k), now));
export const finishStepTap = (db: Writer, user: SessionUser, p: StepPath, now: Date) =>
  withReplan(db, user, p.id, now, finishStep(db, user, p.id, Number(p.n), Number(p.k), now));
export const finishSittingTap = (db: Writer, user: SessionUser, p: SittingPath, body: { leaveOpen: boolean; reason?: string }, now: Date) =>
  withReplan(db, user, p.id, now, finishSitting(db, user, p.id, Number(p.n), body, now));
export const undoTap = (db: Writer, user: SessionUser, p: SittingPath, now: Date) =>
  withReplan(db, user, p.id, now, undoLastTap(db, user, p.id, Number(p.n), now));
