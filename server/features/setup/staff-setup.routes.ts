import { DateTime } from 'luxon';
import { z } from 'zod';
import { setupPaths } from '../../../shared/api/setup-paths';
import { IdParamsSchema, IdSchema } from '../../../shared/schemas/common.schemas';
import { AffectedBookingListSchema, ReassignSchema, StaffDetailsSchema, StaffInviteSchema, StaffListSchema, StaffMemberSchema, TimeOffInputSchema } from '../../../shared/schemas/setup.schemas';
import type { AppDeps } from '../../app-deps';
import { apiRoute } from '../../lib/api-route';
import { AppError, notFound } from '../../lib/app-error';
import { writeAudit } from '../audit/audit.repository';
import { bookingSnapshot } from '../bookings/booking-snapshot.repository';
import { issuePasswordToken } from '../password-reset/password-reset.service';
import { findSalon } from '../salon/salon.repository';
import { affectedMessage } from './affected-message';
import { freeStylistIds, withFreeStylists } from './free-stylists.service';
import { listFutureBookings } from './future-bookings.repository';
import { deactivateStaff, deleteTimeOff, findStaffUser, insertInvitedUser, insertTimeOff, listStaff, reassignBooking, writeStaffDetails } from './staff-setup.repository';

/** An invitation link stays valid for a week (common practice for account invitations). */
export const INVITE_VALID_MINUTES = 7 * 24 * 60;

const TimeOffParamsSchema = z.object({ id: IdSchema, entryId: IdSchema }).strict();

export function registerStaffSetupRoutes({ table, db, mailer, config }: AppDeps): void {
  const member = async (salonId: string, id: string) => {
    const found = (await listStaff(db, salonId, new Date())).find((m) => m.id === id);
    if (!found) throw notFound('That member of staff');
    return found;
  };
  const stylistOf = async (salonId: string, id: string) => {
    const found = await findStaffUser(db, salonId, id);
    if (!found) throw notFound('That member of staff');
    if (!found.staffId) throw new AppError('NOT_FOUND', 404, `${found.name} takes no clients.`);
    return { ...found, staffId: found.staffId };
  };

  apiRoute(
    table,
    { method: 'get', path: setupPaths.staff, access: ['owner'], summary: 'Everyone who works at the salon', response: StaffListSchema },
    async ({ user }) => ({ staff: await listStaff(db, user.salonId, new Date()) }),
  );
  apiRoute(
    table,
    { method: 'post', path: setupPaths.staff, access: ['owner'], summary: 'Invite a member of staff by e-mail (a link to choose a password)', body: StaffInviteSchema, response: StaffMemberSchema, status: 201 },
    async ({ user, body, req }) => {
      const id = await db.transaction().execute(async (trx) => {
        const taken = await trx.selectFrom('users').select('id').where((eb) => eb(eb.fn('lower', ['email']), '=', body.email)).executeTakeFirst();
        if (taken) throw new AppError('EMAIL_TAKEN', 409, 'An account with this e-mail already exists.', { email: 'An account with this e-mail already exists.' });
        const newId = await insertInvitedUser(trx, user.salonId, body.email, body.details);
        await writeAudit(trx, { salonId: user.salonId, actorUserId: user.id, entity: 'staff', entityId: newId, action: 'invited', after: body });
        return newId;
      });
      const salon = await findSalon(db, user.salonId);
      const token = await issuePasswordToken(db, id, INVITE_VALID_MINUTES);
      const baseUrl = config.publicUrl ?? `${req.protocol}://${req.get('host')}`;
      await mailer.send({
        to: body.email,
        subject: `You are invited to ${salon.name} on Dwell`,
        text:
          `Hello ${body.details.name},\n\n${salon.name} has added you to its Dwell book. Choose your password with this link within 7 days:\n` +
          `${baseUrl}/reset-password?token=${token}\n\nThen sign in with this e-mail address.`,
      });
      return member(user.salonId, id);
    },
  );
  apiRoute(
    table,
    { method: 'put', path: '/api/owner/setup/staff/:id', access: ['owner'], summary: "Change a member of staff's role, skills, cap and working hours", params: IdParamsSchema, body: StaffDetailsSchema, response: StaffMemberSchema },
    async ({ user, params, body }) => {
      const before = await member(user.salonId, params.id);
      if (params.id === user.id && body.role !== 'owner') throw new AppError('VALIDATION_FAILED', 400, 'You cannot take away your own owner role.', { role: 'You cannot take away your own owner role.' });
      if (before.staffId && body.role !== 'stylist' && before.futureBookings > 0) {
        throw new AppError('VALIDATION_FAILED', 400, `${before.details.name} has future bookings; re-assign them before changing the role.`, { role: 'Re-assign their future bookings first.' });
      }
      await db.transaction().execute(async (trx) => {
        await writeStaffDetails(trx, user.salonId, params.id, body);
        await writeAudit(trx, { salonId: user.salonId, actorUserId: user.id, entity: 'staff', entityId: params.id, action: 'changed', before: before.details, after: body });
      });
      return member(user.salonId, params.id);
    },
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/owner/setup/staff/:id/time-off', access: ['owner'], summary: 'Add whole days of time off (salon time)', params: IdParamsSchema, body: TimeOffInputSchema, response: StaffMemberSchema, status: 201 },
    async ({ user, params, body }) => {
      const stylist = await stylistOf(user.salonId, params.id);
      const salon = await findSalon(db, user.salonId);
      const from = DateTime.fromISO(body.from, { zone: salon.timeZone });
      const to = DateTime.fromISO(body.to, { zone: salon.timeZone }).plus({ days: 1 });
      await insertTimeOff(db, stylist.staffId, from.toJSDate(), to.toJSDate(), body.reason);
      return member(user.salonId, params.id);
    },
  );
  apiRoute(
    table,
    { method: 'delete', path: '/api/owner/setup/staff/:id/time-off/:entryId', access: ['owner'], summary: 'Remove time off', params: TimeOffParamsSchema, status: 204 },
    async ({ user, params }) => {
      const stylist = await stylistOf(user.salonId, params.id);
      if (!(await deleteTimeOff(db, stylist.staffId, params.entryId))) throw notFound('That time off');
    },
  );
  apiRoute(
    table,
    { method: 'get', path: '/api/owner/setup/staff/:id/future-bookings', access: ['owner'], summary: "A stylist's future bookings, each with the stylists free to take it", params: IdParamsSchema, response: AffectedBookingListSchema },
    async ({ user, params }) => {
      const stylist = await stylistOf(user.salonId, params.id);
      const salon = await findSalon(db, user.salonId);
      const now = new Date();
      const future = await listFutureBookings(db, user.salonId, { stylistId: stylist.staffId }, now);
      return { bookings: await withFreeStylists(db, user.salonId, salon.timeZone, future, now) };
    },
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/owner/setup/staff/:id/reassign', access: ['owner'], summary: 'Give one of their future bookings to a stylist who is free for it', params: IdParamsSchema, body: ReassignSchema, response: AffectedBookingListSchema },
    async ({ user, params, body }) => {
      const stylist = await stylistOf(user.salonId, params.id);
      const salon = await findSalon(db, user.salonId);
      const now = new Date();
      const future = await listFutureBookings(db, user.salonId, { stylistId: stylist.staffId }, now);
      const booking = future.find((b) => b.id === body.bookingId);
      if (!booking) throw notFound('That future booking of this stylist');
      const free = await freeStylistIds(db, user.salonId, salon.timeZone, booking, now);
      if (!free.includes(body.toStaffId)) {
        throw new AppError('CONFLICT', 409, 'That stylist is not free for every step of this booking (hours, time off, skill or other clients).', { toStaffId: 'Pick a stylist who is free for it.' });
      }
      await db.transaction().execute(async (trx) => {
        // The booking as every booking entry records it (stylist by name), so its history reads the same way.
        const before = await bookingSnapshot(trx, body.bookingId);
        await reassignBooking(trx, user.salonId, body.bookingId, body.toStaffId);
        const after = await bookingSnapshot(trx, body.bookingId);
        await writeAudit(trx, { salonId: user.salonId, actorUserId: user.id, entity: 'booking', entityId: body.bookingId, action: 're-assigned', before: before?.audit, after: after?.audit });
      });
      const left = await listFutureBookings(db, user.salonId, { stylistId: stylist.staffId }, now);
      return { bookings: await withFreeStylists(db, user.salonId, salon.timeZone, left, now) };
    },
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/owner/setup/staff/:id/deactivate', access: ['owner'], summary: 'Deactivate a member of staff; refused while they have future bookings', params: IdParamsSchema, response: StaffMemberSchema },
    async ({ user, params }) => {
      const before = await member(user.salonId, params.id);
      if (params.id === user.id) throw new AppError('CONFLICT', 409, 'You cannot deactivate your own account.');
      if (before.staffId) {
        const salon = await findSalon(db, user.salonId);
        const future = await listFutureBookings(db, user.salonId, { stylistId: before.staffId }, new Date());
        if (future.length > 0) {
          throw new AppError('CONFLICT', 409, affectedMessage(`${before.details.name} still has`, future, salon.timeZone) + ' Re-assign or cancel them first.');
        }
      }
      await db.transaction().execute(async (trx) => {
        await deactivateStaff(trx, params.id, before.staffId);
        await writeAudit(trx, { salonId: user.salonId, actorUserId: user.id, entity: 'staff', entityId: params.id, action: 'deactivated', before: before.details });
      });
      return member(user.salonId, params.id);
    },
  );
}
