import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { BookingStatus } from '@shared/schemas/common.schemas';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';

/** A hold (or the booking it became) with what the client's screens show. */
export interface HoldRecord {
  id: string;
  status: BookingStatus;
  salonId: string;
  serviceId: string;
  stylistId: string;
  clientId: string | null;
  heldUntil: Date | null;
  holdSecretHash: string | null;
  depositCents: number;
  stepPlan: StepPlan;
  createdAt: Date;
  salonSlug: string;
  salonName: string;
  timeZone: string;
  currency: string;
  address: string;
  serviceName: string;
  /** The service's own box "needs a skin test" (the steps' product families decide beside it). */
  needsSkinTest: boolean;
  category: string;
  stylistName: string;
  /** The first sitting's start and end. */
  start: Date;
  end: Date;
}

export async function findHold(db: Db, id: string): Promise<HoldRecord | undefined> {
  const row = await db
    .selectFrom('bookings as b')
    .innerJoin('salons as sa', 'sa.id', 'b.salon_id')
    .innerJoin('services as sv', 'sv.id', 'b.service_id')
    .innerJoin('staff as st', 'st.id', 'b.stylist_id')
    .innerJoin('sittings as si', (j) => j.onRef('si.booking_id', '=', 'b.id').on('si.seq', '=', 1))
    .select([
      'b.id',
      'b.status',
      'b.stylist_id',
      'b.held_until',
      'b.hold_secret_hash',
      'b.client_id',
      'b.deposit_cents',
      'b.salon_id',
      'b.service_id',
      'b.step_plan',
      'b.created_at',
      'sa.slug as salonSlug',
      'sa.name as salonName',
      'sa.time_zone as timeZone',
      'sa.currency',
      'sa.address',
      'sv.name as serviceName',
      'sv.needs_skin_test',
      'sv.category',
      'st.display_name as stylistName',
      sql<Date>`lower(si.during)`.as('start'),
      sql<Date>`upper(si.during)`.as('end'),
    ])
    .where('b.id', '=', id)
    .executeTakeFirst();
  if (!row) return undefined;
  return {
    id: row.id,
    status: row.status,
    salonId: row.salon_id,
    serviceId: row.service_id,
    stylistId: row.stylist_id,
    clientId: row.client_id,
    heldUntil: row.held_until,
    holdSecretHash: row.hold_secret_hash,
    depositCents: row.deposit_cents,
    stepPlan: row.step_plan as StepPlan,
    createdAt: row.created_at,
    salonSlug: row.salonSlug,
    salonName: row.salonName,
    timeZone: row.timeZone,
    currency: row.currency,
    address: row.address,
    serviceName: row.serviceName,
    needsSkinTest: row.needs_skin_test,
    category: row.category,
    stylistName: row.stylistName,
    start: row.start,
    end: row.end,
  };
}

export async function markHold(db: Db, id: string, heldUntil: Date, secretHash: string): Promise<void> {
  await db.updateTable('bookings').set({ held_until: heldUntil, hold_secret_hash: secretHash }).where('id', '=', id).execute();
}

/** Removes holds past their time: the time is free again. Returns how many lapsed. */
export async function lapseHolds(db: Db, now: Date, id?: string): Promise<number> {
  let query = db.deleteFrom('bookings').where('status', '=', 'held').where('held_until', '<=', now);
  if (id) query = query.where('id', '=', id);
  const res = await query.executeTakeFirst();
  return Number(res.numDeletedRows);
}

/** The client's holds still within their time (one at most, kept so by a unique index), newest first. */
export async function openHoldIdsOf(db: Db, clientId: string, now: Date): Promise<string[]> {
  const rows = await db
    .selectFrom('bookings')
    .select('id')
    .where('client_id', '=', clientId)
    .where('status', '=', 'held')
    .where('held_until', '>', now)
    .orderBy('created_at', 'desc')
    .execute();
  return rows.map((r) => r.id);
}

export async function setHoldSecret(db: Db, id: string, secretHash: string): Promise<void> {
  await db.updateTable('bookings').set({ hold_secret_hash: secretHash }).where('id', '=', id).where('status', '=', 'held').execute();
}

/** Removes a hold at once (as its lapse would): the time is free again. False when it was no longer held. */
export async function releaseHoldRow(db: Db, id: string): Promise<boolean> {
  const res = await db.deleteFrom('bookings').where('id', '=', id).where('status', '=', 'held').executeTakeFirst();
  return Number(res.numDeletedRows) === 1;
}

/** The client takes a held time still unclaimed (or already theirs), in one statement: of two at once, one wins. */
export async function claimHoldRow(db: Db, id: string, clientId: string): Promise<boolean> {
  const res = await db
    .updateTable('bookings')
    .set({ client_id: clientId })
    .where('id', '=', id)
    .where('status', '=', 'held')
    .where((eb) => eb.or([eb('client_id', 'is', null), eb('client_id', '=', clientId)]))
    .executeTakeFirst();
  return Number(res.numUpdatedRows) === 1;
}

export async function insertCautionAcceptance(db: Db, bookingId: string, userId: string, version: string, texts: unknown): Promise<void> {
  await db
    .insertInto('caution_acceptances')
    .values({ booking_id: bookingId, user_id: userId, version, texts: JSON.stringify(texts) })
    .execute();
}

export async function hasAcceptedCautions(db: Db, bookingId: string, version: string): Promise<boolean> {
  const row = await db.selectFrom('caution_acceptances').select('id').where('booking_id', '=', bookingId).where('version', '=', version).executeTakeFirst();
  return Boolean(row);
}
