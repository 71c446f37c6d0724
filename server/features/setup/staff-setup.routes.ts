import { setupApi } from '@shared/api/setup.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import {
  addTimeOff,
  deactivateStaffMember,
  inviteStaff,
  reassignFutureBooking,
  removeTimeOff,
  saveStaffDetails,
  staffOf,
  stylistFutureBookings,
} from './staff-setup.service';

export function registerStaffSetupRoutes({ table, db, mailer, config }: AppDeps): void {
  apiRoute(table, setupApi.staff, async ({ user }) => staffOf(db, user.salonId, new Date()));
  apiRoute(table, setupApi.inviteStaff, async ({ user, body, req }) => {
    const baseUrl = config.publicUrl ?? `${req.protocol}://${req.get('host')}`;
    return inviteStaff(db, mailer, user, body, baseUrl);
  });
  apiRoute(table, setupApi.saveStaff, async ({ user, params, body }) => saveStaffDetails(db, user, params.id, body));
  apiRoute(table, setupApi.addTimeOff, async ({ user, params, body }) => addTimeOff(db, user.salonId, params.id, body));
  apiRoute(table, setupApi.removeTimeOff, async ({ user, params }) => removeTimeOff(db, user.salonId, params.id, params.entryId));
  apiRoute(table, setupApi.staffBookings, async ({ user, params }) => stylistFutureBookings(db, user.salonId, params.id, new Date()));
  apiRoute(table, setupApi.reassign, async ({ user, params, body }) => reassignFutureBooking(db, user, params.id, body, new Date()));
  apiRoute(table, setupApi.deactivateStaff, async ({ user, params }) => deactivateStaffMember(db, user, params.id));
}
