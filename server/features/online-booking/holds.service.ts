import { randomBytes } from 'node:crypto';
import type { Kysely } from 'kysely';
import type { z } from 'zod';
import type { Database } from '../../db/schema';
import type { SessionUser } from '../../../shared/schemas/auth.schemas';
import type { CreateHoldSchema, Hold } from '../../../shared/schemas/online-booking.schemas';
import type { JobQueue } from '../../jobs/job-queue';
import { sha256 } from '../../lib/hash';
import { AppError, notFound } from '../../lib/app-error';
import { findSalon } from '../salon/salon.repository';
import { findClientIdForUser } from '../clients/clients.repository';
import { lockStylists } from '../planning/stylist-lock';
import { bookAt } from '../bookings/book-at.service';
import { assertHoldSkinTest } from './hold-skin-test';
import { findSalonBySlug } from './public-salon.service';
import { onlineService } from './availability.service';
import { holdCautions } from './hold-cautions';
import { claimHoldRow, findHold, hasAcceptedCautions, insertCautionAcceptance, markHold, type HoldRow } from './holds.repository';

export const LAPSE_HOLD_JOB = 'lapse-hold';

export function holdView(h: HoldRow, now = new Date()): Hold {
  const lapsed = h.status === 'held' && h.held_until !== null && h.held_until <= now;
  return {
    holdId: h.id, status: h.status === 'held' ? (lapsed ? 'lapsed' : 'held') : 'booked', heldUntil: h.held_until?.toISOString() ?? null,
    salonName: h.salonName, serviceName: h.serviceName, stylistName: h.stylistName, start: h.start.toISOString(), end: h.end.toISOString(),
    timeZone: h.timeZone, depositCents: h.deposit_cents, currency: h.currency,
  };
}

/** Keeps a time for the salon's hold minutes; the engine checks it is free, a job lets it lapse. */
export async function createHold(db: Kysely<Database>, jobs: JobQueue, body: z.infer<typeof CreateHoldSchema>, now: Date) {
  const row = await findSalonBySlug(db, body.salonSlug);
  const salon = await findSalon(db, row.id);
  const service = await onlineService(db, salon.id, body.serviceId);
  const secret = randomBytes(24).toString('base64url');
  const heldUntil = new Date(now.getTime() + row.hold_minutes * 60_000);
  const id = await db.transaction().execute(async (trx) => {
    await lockStylists(trx, [body.stylistId]);
    const bookingId = await bookAt(trx, { salon, clientId: null, service, plan: service.stepPlan, stylistId: body.stylistId, start: new Date(body.start), actorUserId: null, now, status: 'held' });
    await markHold(trx, bookingId, heldUntil, sha256(secret));
    return bookingId;
  });
  await jobs.schedule(LAPSE_HOLD_JOB, { bookingId: id }, heldUntil);
  return { ...holdView((await findHold(db, id))!, now), holdSecret: secret };
}

/** The hold, if the secret matches; a lapsed (removed) hold is answered as lapsed. */
export async function heldByHolder(db: Kysely<Database>, id: string, secret: string, now: Date): Promise<HoldRow> {
  const hold = await findHold(db, id);
  if (!hold) throw new AppError('HOLD_LAPSED', 409, 'The time was released because the hold ran out. Please pick a time again.');
  if (hold.hold_secret_hash !== sha256(secret) && hold.status === 'held') throw notFound('That hold');
  if (hold.status === 'held' && hold.held_until && hold.held_until <= now) {
    throw new AppError('HOLD_LAPSED', 409, 'The time was released because the hold ran out. Please pick a time again.');
  }
  return hold;
}

/** The signed-in client takes the hold; the skin-test rule is checked now that we know who it is for. */
export async function claimHold(db: Kysely<Database>, user: SessionUser, id: string, secret: string, now: Date) {
  const hold = await heldByHolder(db, id, secret, now);
  const clientId = await findClientIdForUser(db, user.id);
  if (!clientId || hold.salon_id !== user.salonId) throw notFound('That hold');
  if (hold.status !== 'held') throw new AppError('CONFLICT', 409, 'This time is already booked.');
  if (hold.client_id && hold.client_id !== clientId) throw notFound('That hold');
  const salon = await findSalon(db, hold.salon_id);
  await assertHoldSkinTest(db, salon, hold, clientId, now);
  await claimHoldRow(db, id, clientId);
  return { ...holdView(hold, now), cautions: holdCautions(hold, salon) };
}

export async function acceptCautions(db: Kysely<Database>, user: SessionUser, id: string, secret: string, version: string, now: Date): Promise<void> {
  const hold = await ownHold(db, user, id, secret, now);
  const salon = await findSalon(db, hold.salon_id);
  const cautions = holdCautions(hold, salon);
  if (version !== cautions.version) throw new AppError('CONFLICT', 409, 'The cautions have changed; please read them again.');
  if (!(await hasAcceptedCautions(db, id, version))) await insertCautionAcceptance(db, id, user.id, version, cautions.items);
}

/** A hold claimed by this signed-in client. */
export async function ownHold(db: Kysely<Database>, user: SessionUser, id: string, secret: string, now: Date): Promise<HoldRow> {
  const hold = await heldByHolder(db, id, secret, now);
  const clientId = await findClientIdForUser(db, user.id);
  if (!clientId || hold.client_id !== clientId) throw notFound('That hold');
  return hold;
}
