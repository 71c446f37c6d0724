import { randomBytes } from 'node:crypto';
import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { HoldStep, OpenHold } from '@shared/schemas/online-booking.schemas';
import { sha256 } from '@server/lib/hash';
import { AppError, notFound } from '@server/lib/app-error';
import { findSalon } from '../salon';
import { findClientIdForUser } from '../clients';
import { findHairHistory } from '../hair-history';
import { holdCautions } from './hold-cautions';
import { findHold, hasAcceptedCautions, openHoldIdsOf, releaseHoldRow, setHoldSecret, type HoldRecord } from './holds.repository';
import { holdLapsed, holdView } from './hold-view';
import { formatDateTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

/*
 * A client keeps one unpaid hold at a time. Starting again offers the one they have (resume) or lets them free it
 * (release); a second hold is refused, and the database's unique index on a client's held bookings has the last word.
 */

/** The refusal of a second hold, naming the one the client already has (when known) so they can go back to it. */
export function holdOpenError(hold?: Pick<HoldRecord, 'serviceName' | 'start' | 'timeZone'>): AppError {
  const which = hold ? `: ${hold.serviceName} on ${formatDateTime(hold.start, formatFor(hold.timeZone), { year: false })}` : '';
  return new AppError(
    'HOLD_OPEN',
    409,
    `You already have a time held${which}. One time can be held at a time: finish booking it, or release it to pick another.`,
  );
}

/**
 * The step a resumed hold goes back to: the deposit once its current cautions are accepted; the cautions once the
 * hair history was saved during this hold (the details step's one action saves it); otherwise the details.
 */
async function stepOf(db: Kysely<Database>, hold: HoldRecord, clientId: string): Promise<HoldStep> {
  const salon = await findSalon(db, hold.salonId);
  if (await hasAcceptedCautions(db, hold.id, holdCautions(hold, salon).version)) return 'deposit';
  const history = await findHairHistory(db, clientId);
  return history.updatedAt && Date.parse(history.updatedAt) >= hold.createdAt.getTime() ? 'cautions' : 'details';
}

async function openHoldView(db: Kysely<Database>, hold: HoldRecord, clientId: string, now: Date): Promise<OpenHold> {
  return { ...holdView(hold, now), salonSlug: hold.salonSlug, serviceId: hold.serviceId, step: await stepOf(db, hold, clientId) };
}

/** The signed-in client's unpaid holds still within their time (at most one). */
export async function myOpenHolds(db: Kysely<Database>, user: SessionUser, now: Date): Promise<OpenHold[]> {
  const clientId = await findClientIdForUser(db, user.id);
  if (!clientId) return [];
  const holds = await Promise.all((await openHoldIdsOf(db, clientId, now)).map((id) => findHold(db, id)));
  return Promise.all(holds.filter((h): h is HoldRecord => Boolean(h)).map((h) => openHoldView(db, h, clientId, now)));
}

/** Refuses a new hold while the client has one open. */
export async function assertNoOpenHold(db: Kysely<Database>, clientId: string, now: Date, except?: string): Promise<void> {
  const other = (await openHoldIdsOf(db, clientId, now)).find((id) => id !== except);
  const hold = other && (await findHold(db, other));
  if (hold) throw holdOpenError(hold);
}

/** The client's own claimed hold, still within its time. */
async function ownOpenHold(db: Kysely<Database>, user: SessionUser, id: string, now: Date) {
  const [hold, clientId] = await Promise.all([findHold(db, id), findClientIdForUser(db, user.id)]);
  if (hold && clientId && hold.clientId !== null && hold.clientId !== clientId) throw notFound('That hold');
  if (!hold || (hold.status === 'held' && hold.heldUntil !== null && hold.heldUntil <= now)) throw holdLapsed();
  return { hold, clientId };
}

/**
 * Back into the flow from My bookings (or another tab): a new secret for the hold (the sessionStorage of the tab that
 * made it is not here), the cautions to read, and the step to go back to.
 */
export async function resumeHold(db: Kysely<Database>, user: SessionUser, id: string, now: Date) {
  const { hold, clientId } = await ownOpenHold(db, user, id, now);
  if (!clientId || hold.clientId !== clientId) throw notFound('That hold');
  if (hold.status !== 'held') throw new AppError('CONFLICT', 409, 'This time is already booked.');
  const secret = randomBytes(24).toString('base64url');
  await setHoldSecret(db, id, sha256(secret));
  const salon = await findSalon(db, hold.salonId);
  return { ...(await openHoldView(db, hold, clientId, now)), holdSecret: secret, cautions: holdCautions(hold, salon) };
}

/**
 * Frees a held time at once. The client's own claimed hold needs no secret; a hold nobody has claimed yet (made in this
 * tab before signing in) needs the secret it was made with.
 */
export async function releaseHold(db: Kysely<Database>, user: SessionUser, id: string, secret: string | undefined, now: Date): Promise<void> {
  const { hold, clientId } = await ownOpenHold(db, user, id, now);
  const mine = clientId !== null && hold.clientId === clientId;
  const holder = hold.clientId === null && secret !== undefined && hold.holdSecretHash === sha256(secret);
  if (!mine && !holder) throw notFound('That hold');
  if (hold.status !== 'held') throw new AppError('CONFLICT', 409, 'This time is already booked; cancel it from My bookings instead.');
  if (!(await releaseHoldRow(db, id))) throw holdLapsed();
}
