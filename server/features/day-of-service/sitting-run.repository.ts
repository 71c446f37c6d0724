import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { BookingStatus } from '@shared/schemas/common.schemas';
import type { SittingStatus, TapAction } from '@shared/schemas/day-of-service.schemas';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';

/** One step of a sitting as planned and as tapped. */
export interface RunStep {
  id: string;
  seq: number;
  kind: 'hands_on' | 'developing' | 'basin';
  label: string;
  start: Date;
  end: Date;
  actualStart: Date | null;
  actualEnd: Date | null;
  startedBy: string | null;
  finishedBy: string | null;
}

/** What a sitting's day state is: its own fields and its steps' actual times (what a tap changes, and an undo restores). */
export interface SittingState {
  status: SittingStatus;
  arrivedAt: Date | null;
  lateMinutes: number | null;
  leftOpenReason: string | null;
}

/** A sitting with its booking, as every tap reads it (after taking the stylist's lock). */
export interface SittingForTap {
  booking: {
    id: string;
    salonId: string;
    status: BookingStatus;
    clientId: string | null;
    stylistId: string;
    stepPlan: StepPlan;
    depositCents: number;
    depositOutcome: 'kept' | 'refunded' | null;
    serviceAsks: boolean;
    clientName: string;
    serviceName: string;
  };
  sitting: SittingState & { id: string; seq: number; of: number; start: Date; end: Date };
  steps: RunStep[];
  /** Every sitting's status of the booking, in order (the booking's status follows them). */
  sittingStatuses: SittingStatus[];
}

/** The booking's stylist and salon, read before the lock (the rest is read after it). */
export async function bookingOwner(db: Db, bookingId: string): Promise<{ salonId: string; stylistId: string } | undefined> {
  const row = await db.selectFrom('bookings').select(['salon_id', 'stylist_id']).where('id', '=', bookingId).executeTakeFirst();
  return row && { salonId: row.salon_id, stylistId: row.stylist_id };
}

export async function findSittingForTap(db: Db, bookingId: string, seq: number): Promise<SittingForTap | undefined> {
  const booking = await db
    .selectFrom('bookings as b')
    .innerJoin('services as sv', 'sv.id', 'b.service_id')
    .leftJoin('clients as c', 'c.id', 'b.client_id')
    .select([
      'b.id',
      'b.salon_id',
      'b.status',
      'b.client_id',
      'b.stylist_id',
      'b.step_plan',
      'b.deposit_cents',
      'b.deposit_outcome',
      'sv.needs_skin_test',
      'sv.name as serviceName',
      'c.name as clientName',
    ])
    .where('b.id', '=', bookingId)
    .executeTakeFirst();
  if (!booking) return undefined;
  const sittings = await db
    .selectFrom('sittings')
    .select(['id', 'seq', 'status', 'arrived_at', 'late_minutes', 'left_open_reason', sql<Date>`lower(during)`.as('start'), sql<Date>`upper(during)`.as('end')])
    .where('booking_id', '=', bookingId)
    .orderBy('seq')
    .execute();
  const sitting = sittings.find((s) => s.seq === seq);
  if (!sitting) return undefined;
  const steps = await db
    .selectFrom('booking_steps')
    .select([
      'id',
      'seq',
      'kind',
      'label',
      'actual_start',
      'actual_end',
      'started_by',
      'finished_by',
      sql<Date>`lower(during)`.as('start'),
      sql<Date>`upper(during)`.as('end'),
    ])
    .where('sitting_id', '=', sitting.id)
    .orderBy('seq')
    .execute();
  return {
    booking: {
      id: booking.id,
      salonId: booking.salon_id,
      status: booking.status,
      clientId: booking.client_id,
      stylistId: booking.stylist_id,
      stepPlan: booking.step_plan as StepPlan,
      depositCents: booking.deposit_cents,
      depositOutcome: booking.deposit_outcome,
      serviceAsks: booking.needs_skin_test,
      clientName: booking.clientName ?? '',
      serviceName: booking.serviceName,
    },
    sitting: {
      id: sitting.id,
      seq: sitting.seq,
      of: sittings.length,
      start: sitting.start,
      end: sitting.end,
      status: sitting.status,
      arrivedAt: sitting.arrived_at,
      lateMinutes: sitting.late_minutes,
      leftOpenReason: sitting.left_open_reason,
    },
    steps: steps.map((s) => ({
      id: s.id,
      seq: s.seq,
      kind: s.kind,
      label: s.label,
      start: s.start,
      end: s.end,
      actualStart: s.actual_start,
      actualEnd: s.actual_end,
      startedBy: s.started_by,
      finishedBy: s.finished_by,
    })),
    sittingStatuses: sittings.map((s) => s.status),
  };
}

export async function setSittingState(db: Db, sittingId: string, state: SittingState): Promise<void> {
  await db
    .updateTable('sittings')
    .set({ status: state.status, arrived_at: state.arrivedAt, late_minutes: state.lateMinutes, left_open_reason: state.leftOpenReason })
    .where('id', '=', sittingId)
    .execute();
}

export async function setStepActuals(db: Db, step: Pick<RunStep, 'id' | 'actualStart' | 'actualEnd' | 'startedBy' | 'finishedBy'>): Promise<void> {
  await db
    .updateTable('booking_steps')
    .set({ actual_start: step.actualStart, actual_end: step.actualEnd, started_by: step.startedBy, finished_by: step.finishedBy })
    .where('id', '=', step.id)
    .execute();
}

/** A no-show's sitting stops holding its chair, basin and the stylist's hands (as a cancellation's do). */
export async function releaseSitting(db: Db, sittingId: string): Promise<void> {
  await db.updateTable('sittings').set({ live: false }).where('id', '=', sittingId).execute();
  await db.updateTable('booking_steps').set({ live: false }).where('sitting_id', '=', sittingId).execute();
}

export async function setBookingStatus(db: Db, bookingId: string, status: BookingStatus): Promise<void> {
  await db.updateTable('bookings').set({ status }).where('id', '=', bookingId).execute();
}

export async function setDepositOutcome(db: Db, bookingId: string, outcome: 'kept' | 'refunded'): Promise<void> {
  await db.updateTable('bookings').set({ deposit_outcome: outcome }).where('id', '=', bookingId).execute();
}

/** What a tap changed, kept so the tap can be undone: the sitting, the booking's status and every step's actuals. */
export interface TapBefore {
  sitting: SittingState;
  bookingStatus: BookingStatus;
  steps: Pick<RunStep, 'id' | 'actualStart' | 'actualEnd' | 'startedBy' | 'finishedBy'>[];
}

export interface Tap {
  id: string;
  action: TapAction;
  stepSeq: number | null;
  at: Date;
  byUserId: string | null;
  before: TapBefore;
  undoneAt: Date | null;
}

export async function insertTap(db: Db, sittingId: string, tap: Omit<Tap, 'id' | 'undoneAt'>): Promise<void> {
  await db
    .insertInto('sitting_taps')
    .values({ sitting_id: sittingId, action: tap.action, step_seq: tap.stepSeq, at: tap.at, by_user_id: tap.byUserId, before: JSON.stringify(tap.before) })
    .execute();
}

/** The sitting's most recent tap (undone or not). JSON keeps the instants as text; they come back as Dates. */
export async function latestTap(db: Db, sittingId: string): Promise<Tap | undefined> {
  const row = await db
    .selectFrom('sitting_taps')
    .selectAll()
    .where('sitting_id', '=', sittingId)
    .orderBy('at', 'desc')
    .orderBy('id')
    .limit(1)
    .executeTakeFirst();
  if (!row) return undefined;
  const raw = row.before as {
    sitting: Record<keyof SittingState, string | number | null>;
    bookingStatus: BookingStatus;
    steps: { id: string; actualStart: string | null; actualEnd: string | null; startedBy: string | null; finishedBy: string | null }[];
  };
  const date = (v: unknown) => (typeof v === 'string' ? new Date(v) : null);
  return {
    id: row.id,
    action: row.action,
    stepSeq: row.step_seq,
    at: row.at,
    byUserId: row.by_user_id,
    undoneAt: row.undone_at,
    before: {
      bookingStatus: raw.bookingStatus,
      sitting: {
        status: raw.sitting.status as SittingStatus,
        arrivedAt: date(raw.sitting.arrivedAt),
        lateMinutes: raw.sitting.lateMinutes as number | null,
        leftOpenReason: raw.sitting.leftOpenReason as string | null,
      },
      steps: raw.steps.map((s) => ({
        id: s.id,
        actualStart: date(s.actualStart),
        actualEnd: date(s.actualEnd),
        startedBy: s.startedBy,
        finishedBy: s.finishedBy,
      })),
    },
  };
}

export async function markTapUndone(db: Db, tapId: string, at: Date): Promise<void> {
  await db.updateTable('sitting_taps').set({ undone_at: at }).where('id', '=', tapId).execute();
}
