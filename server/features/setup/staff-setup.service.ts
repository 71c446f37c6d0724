import { DateTime } from 'luxon';
import type { Db } from '@server/db/database';
import type { Mailer } from '@server/mail/mailer';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { AffectedBooking, StaffDetails, StaffInvite, StaffMember, TimeOffInput } from '@shared/schemas/setup.schemas';
import { AppError, notFound } from '@server/lib/app-error';
import { writeAudit } from '../audit';
import { bookingSnapshot } from '../bookings';
import { issuePasswordToken } from '../password-reset';
import { findSalon } from '../salon';
import { findUserByEmail } from '../session';
import { affectedMessage } from './affected-message';
import { freeStylistIds, withFreeStylists } from './free-stylists.service';
import { listFutureBookings } from './future-bookings.repository';
import {
  deactivateStaff,
  deleteTimeOff,
  findStaffUser,
  insertInvitedUser,
  insertTimeOff,
  listStaff,
  reassignBooking,
  writeStaffDetails,
} from './staff-setup.repository';

/** An invitation link stays valid for a week (common practice for account invitations). */
export const INVITE_VALID_MINUTES = 7 * 24 * 60;

async function member(db: Db, salonId: string, id: string): Promise<StaffMember> {
  const found = (await listStaff(db, salonId, new Date())).find((m) => m.id === id);
  if (!found) throw notFound('That member of staff');
  return found;
}

/** The member of staff as a stylist (one who takes clients); 404 for anyone else. */
async function stylistOf(db: Db, salonId: string, id: string) {
  const found = await findStaffUser(db, salonId, id);
  if (!found) throw notFound('That member of staff');
  if (!found.staffId) throw new AppError('NOT_FOUND', 404, `${found.name} takes no clients.`);
  return { ...found, staffId: found.staffId };
}

export async function staffOf(db: Db, salonId: string, now: Date): Promise<{ staff: StaffMember[] }> {
  return { staff: await listStaff(db, salonId, now) };
}

/** Adds the account and e-mails the invitation: a link to choose a password, then sign in with this address. */
export async function inviteStaff(db: Db, mailer: Mailer, user: SessionUser, invite: StaffInvite, baseUrl: string): Promise<StaffMember> {
  const id = await db.transaction().execute(async (trx) => {
    if (await findUserByEmail(trx, invite.email))
      throw new AppError('EMAIL_TAKEN', 409, 'An account with this e-mail already exists.', { email: 'An account with this e-mail already exists.' });
    const newId = await insertInvitedUser(trx, user.salonId, invite.email, invite.details);
    await writeAudit(trx, { salonId: user.salonId, actorUserId: user.id, entity: 'staff', entityId: newId, action: 'invited', after: invite });
    return newId;
  });
  const salon = await findSalon(db, user.salonId);
  const token = await issuePasswordToken(db, id, INVITE_VALID_MINUTES);
  await mailer.send({
    to: invite.email,
    subject: `You are invited to ${salon.name} on Dwell`,
    text:
      `Hello ${invite.details.name},\n\n${salon.name} has added you to its Dwell book. Choose your password with this link within 7 days:\n` +
      `${baseUrl}/reset-password?token=${token}\n\nThen sign in with this e-mail address.`,
  });
  return member(db, user.salonId, id);
}

export async function saveStaffDetails(db: Db, user: SessionUser, id: string, details: StaffDetails): Promise<StaffMember> {
  const before = await member(db, user.salonId, id);
  if (id === user.id && details.role !== 'owner')
    throw new AppError('VALIDATION_FAILED', 400, 'You cannot take away your own owner role.', { role: 'You cannot take away your own owner role.' });
  if (before.staffId && details.role !== 'stylist' && before.futureBookings > 0) {
    throw new AppError('VALIDATION_FAILED', 400, `${before.details.name} has future bookings; re-assign them before changing the role.`, {
      role: 'Re-assign their future bookings first.',
    });
  }
  await db.transaction().execute(async (trx) => {
    await writeStaffDetails(trx, user.salonId, id, details);
    await writeAudit(trx, {
      salonId: user.salonId,
      actorUserId: user.id,
      entity: 'staff',
      entityId: id,
      action: 'changed',
      before: before.details,
      after: details,
    });
  });
  return member(db, user.salonId, id);
}

/** Whole days of time off, from 00:00 of the first to 00:00 after the last (salon time). */
export async function addTimeOff(db: Db, salonId: string, id: string, input: TimeOffInput): Promise<StaffMember> {
  const stylist = await stylistOf(db, salonId, id);
  const salon = await findSalon(db, salonId);
  const from = DateTime.fromISO(input.from, { zone: salon.timeZone });
  const to = DateTime.fromISO(input.to, { zone: salon.timeZone }).plus({ days: 1 });
  await insertTimeOff(db, stylist.staffId, from.toJSDate(), to.toJSDate(), input.reason);
  return member(db, salonId, id);
}

export async function removeTimeOff(db: Db, salonId: string, id: string, entryId: string): Promise<void> {
  const stylist = await stylistOf(db, salonId, id);
  if (!(await deleteTimeOff(db, stylist.staffId, entryId))) throw notFound('That time off');
}

async function futureOf(db: Db, salonId: string, staffId: string, zone: string, now: Date): Promise<{ bookings: AffectedBooking[] }> {
  const future = await listFutureBookings(db, salonId, { stylistId: staffId }, now);
  return { bookings: await withFreeStylists(db, salonId, zone, future, now) };
}

/** A stylist's future bookings, each with the stylists free to take it. */
export async function stylistFutureBookings(db: Db, salonId: string, id: string, now: Date): Promise<{ bookings: AffectedBooking[] }> {
  const stylist = await stylistOf(db, salonId, id);
  const salon = await findSalon(db, salonId);
  return futureOf(db, salonId, stylist.staffId, salon.timeZone, now);
}

/** Gives one of the stylist's future bookings to a stylist free for every step of it; answers what is left. */
export async function reassignFutureBooking(
  db: Db,
  user: SessionUser,
  id: string,
  move: { bookingId: string; toStaffId: string },
  now: Date,
): Promise<{ bookings: AffectedBooking[] }> {
  const stylist = await stylistOf(db, user.salonId, id);
  const salon = await findSalon(db, user.salonId);
  const future = await listFutureBookings(db, user.salonId, { stylistId: stylist.staffId }, now);
  const booking = future.find((b) => b.id === move.bookingId);
  if (!booking) throw notFound('That future booking of this stylist');
  const free = await freeStylistIds(db, user.salonId, salon.timeZone, booking, now);
  if (!free.includes(move.toStaffId)) {
    throw new AppError('CONFLICT', 409, 'That stylist is not free for every step of this booking (hours, time off, skill or other clients).', {
      toStaffId: 'Pick a stylist who is free for it.',
    });
  }
  await db.transaction().execute(async (trx) => {
    // The booking as every booking entry records it (stylist by name), so its history reads the same way.
    const before = await bookingSnapshot(trx, move.bookingId);
    await reassignBooking(trx, user.salonId, move.bookingId, move.toStaffId);
    const after = await bookingSnapshot(trx, move.bookingId);
    await writeAudit(trx, {
      salonId: user.salonId,
      actorUserId: user.id,
      entity: 'booking',
      entityId: move.bookingId,
      action: 're-assigned',
      before: before?.audit,
      after: after?.audit,
    });
  });
  return futureOf(db, user.salonId, stylist.staffId, salon.timeZone, now);
}

/** Deactivates a member of staff; refused for oneself and while they have future bookings. */
export async function deactivateStaffMember(db: Db, user: SessionUser, id: string): Promise<StaffMember> {
  const before = await member(db, user.salonId, id);
  if (id === user.id) throw new AppError('CONFLICT', 409, 'You cannot deactivate your own account.');
  if (before.staffId) {
    const salon = await findSalon(db, user.salonId);
    const future = await listFutureBookings(db, user.salonId, { stylistId: before.staffId }, new Date());
    if (future.length > 0) {
      throw new AppError('CONFLICT', 409, affectedMessage(`${before.details.name} still has`, future, salon.timeZone) + ' Re-assign or cancel them first.');
    }
  }
  await db.transaction().execute(async (trx) => {
    await deactivateStaff(trx, id, before.staffId);
    await writeAudit(trx, { salonId: user.salonId, actorUserId: user.id, entity: 'staff', entityId: id, action: 'deactivated', before: before.details });
  });
  return member(db, user.salonId, id);
}
