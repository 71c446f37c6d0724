import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { SittingRun } from '@shared/schemas/day-of-service.schemas';
import { arriveSitting } from './arrival.service';
import { markNoShow } from './no-show.service';
import { finishSitting, finishStep, startStep } from './step-taps.service';
import { undoLastTap } from './undo-tap.service';

/*
 * The routes' doors into running the day: each reads the sitting (and step) numbers from the path and makes one tap.
 */

type Writer = Kysely<Database>;
type SittingPath = { id: string; n: string };
type StepPath = SittingPath & { k: string };

export const arriveAtDesk = (db: Writer, user: SessionUser, p: SittingPath, now: Date): Promise<SittingRun> => arriveSitting(db, user, p.id, Number(p.n), now);
export const noShowAtDesk = (db: Writer, user: SessionUser, p: SittingPath, now: Date): Promise<SittingRun> => markNoShow(db, user, p.id, Number(p.n), now);
export const startStepTap = (db: Writer, user: SessionUser, p: StepPath, now: Date): Promise<SittingRun> =>
  startStep(db, user, p.id, Number(p.n), Number(p.k), now);
export const finishStepTap = (db: Writer, user: SessionUser, p: StepPath, now: Date): Promise<SittingRun> =>
  finishStep(db, user, p.id, Number(p.n), Number(p.k), now);
export const finishSittingTap = (db: Writer, user: SessionUser, p: SittingPath, body: { leaveOpen: boolean; reason?: string }, now: Date) =>
  finishSitting(db, user, p.id, Number(p.n), body, now);
export const undoTap = (db: Writer, user: SessionUser, p: SittingPath, now: Date): Promise<SittingRun> => undoLastTap(db, user, p.id, Number(p.n), now);
