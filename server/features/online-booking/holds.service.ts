import { randomBytes } from 'node:crypto';
import type { Kysely } from 'kysely';
import type { z } from 'zod';
import type { Database } from '@server/db/schema';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { CreateHoldSchema } from '@shared/schemas/online-booking.schemas';
import type { JobQueue } from '@server/jobs/job-queue';
import { sha256 } from '@server/lib/hash';
import { AppError, notFound } from '@server/lib/app-error';
import { isUniqueViolation } from '@server/lib/unique-violation';
import { findSalon } from '../salon';
import { findClientIdForUser } from '../clients';
import { lockStylists } from '../planning';
import { bookAt } from '../bookings';
import { assertHoldSkinTest } from './hold-skin-test';
import { findSalonBySlug } from './public-salon.repository';
import { onlineService } from './availability.service';
import { holdCautions } from './hold-cautions';
import { holdLapsed, holdView } from './hold-view';
import { assertNoOpenHold, holdOpenError } from './open-holds.service';
import { claimHoldRow, findHold, hasAcceptedCautions, insertCautionAcceptance, markHold, type HoldRecord } from './holds.repository';

export const LAPSE_HOLD_JOB = 'lapse-hold';

/**
 * Keeps a time for the salon's hold minutes; the engine checks it is free, a job lets it lapse. A signed-in client
 * of the salon who already holds a time is sent back to it instead (one open hold per client).
 */
export async function createHold(db: Kysely<Database>, jobs: JobQueue, user: SessionUser | undefined, body: z.infer<typeof CreateHoldSchema>, now: Date) {
  const salon = await findSalonBySlug(db, body.salonSlug);
  const service = await onlineService(db, salon.id, body.serviceId);
  const clientId = user?.role === 'client' && user.salonId === salon.id ? await findClientIdForUser(db, user.id) : null;
  if (clientId) await assertNoOpenHold(db, clientId, now);
  const secret = randomBytes(24).toString('base64url');
  const heldUntil = new Date(now.getTime() + salon.holdMinutes * 60_000);
  const id = await db.transaction().execute(async (trx) => {
    await lockStylists(trx, [body.stylistId]);
    const bookingId = await bookAt(trx, {
      salon,
      clientId: null,
      service,
      plan: service.stepPlan,
      stylistId: body.stylistId,
      start: new Date(body.start),
      actorUserId: null,
      now,
      status: 'held',
    });
    await markHold(trx, bookingId, heldUntil, sha256(secret));
    return bookingId;
  });
  await jobs.schedule(LAPSE_HOLD_JOB, { bookingId: id }, heldUntil);
  return { ...holdView((await findHold(db, id))!, now), holdSecret: secret };
}

/** Where a hold stands; public, so the answer names no client. */
export async function holdStatus(db: Kysely<Database>, id: string, now: Date) {
  const hold = await findHold(db, id);
  if (!hold) throw holdLapsed();
  return holdView(hold, now);
}

/** The hold, if the secret matches; a lapsed (removed) hold is answered as lapsed. */
export async function heldByHolder(db: Kysely<Database>, id: string, secret: string, now: Date): Promise<HoldRecord> {
  const hold = await findHold(db, id);
  if (!hold) throw holdLapsed();
  if (hold.holdSecretHash !== sha256(secret) && hold.status === 'held') throw notFound('That hold');
  if (hold.status === 'held' && hold.heldUntil && hold.heldUntil <= now) {
    throw holdLapsed();
  }
  return hold;
}

/** The signed-in client takes the hold; the skin-test rule is checked now that we know who it is for. */
export async function claimHold(db: Kysely<Database>, user: SessionUser, id: string, secret: string, now: Date) {
  const hold = await heldByHolder(db, id, secret, now);
  const clientId = await findClientIdForUser(db, user.id);
  if (!clientId || hold.salonId !== user.salonId) throw notFound('That hold');
  if (hold.status !== 'held') throw new AppError('CONFLICT', 409, 'This time is already booked.');
  if (hold.clientId && hold.clientId !== clientId) throw notFound('That hold');
  await assertNoOpenHold(db, clientId, now, id);
  const salon = await findSalon(db, hold.salonId);
  await assertHoldSkinTest(db, salon, hold, clientId, now);
  try {
    if (!(await claimHoldRow(db, id, clientId))) throw new AppError('CONFLICT', 409, 'Someone else took this time a moment ago; please pick another.');
  } catch (e) {
    // Another tab claimed a hold for this client a moment ago (one open hold per client).
    if (!isUniqueViolation(e)) throw e;
    await assertNoOpenHold(db, clientId, now, id);
    throw holdOpenError();
  }
  return { ...holdView(hold, now), cautions: holdCautions(hold, salon) };
}

export async function acceptCautions(db: Kysely<Database>, user: SessionUser, id: string, secret: string, version: string, now: Date): Promise<void> {
  const hold = await ownHold(db, user, id, secret, now);
  const salon = await findSalon(db, hold.salonId);
  const cautions = holdCautions(hold, salon);
  if (version !== cautions.version) throw new AppError('CONFLICT', 409, 'The cautions have changed; please read them again.');
  if (!(await hasAcceptedCautions(db, id, version))) await insertCautionAcceptance(db, id, user.id, version, cautions.items);
}

/** A hold claimed by this signed-in client. */
export async function ownHold(db: Kysely<Database>, user: SessionUser, id: string, secret: string, now: Date): Promise<HoldRecord> {
  const hold = await heldByHolder(db, id, secret, now);
  const clientId = await findClientIdForUser(db, user.id);
  if (!clientId || hold.clientId !== clientId) throw notFound('That hold');
  return hold;
}
