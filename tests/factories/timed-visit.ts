import type { Db } from '@server/db/database';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { insertBooking } from '@server/features/bookings/bookings.repository';

const MINUTE = 60_000;

export interface TimedVisit {
  salonId: string;
  serviceId: string;
  stylistId: string;
  clientId: string;
  chairId: string;
  basinId: string;
  /** A one-sitting plan; its steps are planned back to back from `plannedStart`, developing at its most. */
  plan: StepPlan;
  plannedStart: Date;
  /** Minutes after the planned start that the first step really started (negative: early). */
  startDelay?: number;
  /** Each step's actual minutes in order, the steps back to back from the actual start. */
  actual: number[];
  /** Minutes the client arrived late (kept on the sitting as the desk's arrival keeps it). */
  lateMinutes?: number;
  /** `finished` (default) or a sitting still under way. */
  status?: 'finished' | 'in_progress';
}

/** A booking whose one sitting ran with the given actual step times, straight into the book. */
export async function insertTimedVisit(db: Db, v: TimedVisit): Promise<string> {
  const steps = v.plan.sittings[0]!.steps;
  let at = v.plannedStart.getTime();
  const planned = steps.map((s) => {
    const start = new Date(at);
    at += (s.kind === 'developing' ? s.maxMinutes : s.minutes) * MINUTE;
    return { kind: s.kind, label: s.label, start, end: new Date(at), basinId: s.kind === 'basin' ? v.basinId : null };
  });
  const status = v.status ?? 'finished';
  const bookingId = await insertBooking(db, {
    salonId: v.salonId,
    clientId: v.clientId,
    serviceId: v.serviceId,
    stylistId: v.stylistId,
    status: status === 'finished' ? 'finished' : 'checked_in',
    stepPlan: v.plan,
    priceCents: 10000,
    depositCents: 0,
    createdBy: null,
    sittings: [{ chairId: v.chairId, steps: planned }],
  });
  const sitting = await db.selectFrom('sittings').select('id').where('booking_id', '=', bookingId).executeTakeFirstOrThrow();
  const late = v.lateMinutes ?? 0;
  await db
    .updateTable('sittings')
    .set({ status, arrived_at: new Date(v.plannedStart.getTime() + late * MINUTE), late_minutes: late })
    .where('id', '=', sitting.id)
    .execute();
  const rows = await db.selectFrom('booking_steps').select(['id', 'seq']).where('sitting_id', '=', sitting.id).orderBy('seq').execute();
  let actualAt = v.plannedStart.getTime() + (v.startDelay ?? 0) * MINUTE;
  for (const [i, row] of rows.entries()) {
    const minutes = v.actual[i];
    if (minutes === undefined) break;
    const start = new Date(actualAt);
    actualAt += minutes * MINUTE;
    await db
      .updateTable('booking_steps')
      .set({ actual_start: start, actual_end: new Date(actualAt) })
      .where('id', '=', row.id)
      .execute();
  }
  return bookingId;
}
