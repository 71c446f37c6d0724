import { z } from 'zod';
import { apiPaths } from '../../../shared/api/api-paths';
import { BookingViewSchema } from '../../../shared/schemas/booking-view.schemas';
import { FillWindowSchema, OfferTokenParamsSchema, OfferViewSchema, OfferWindowSchema, WindowListSchema, WindowsQuerySchema } from '../../../shared/schemas/window.schemas';
import type { AppDeps } from '../../app-deps';
import { STAFF } from '../../auth/require-access';
import { apiRoute } from '../../lib/api-route';
import { findSalon } from '../salon/salon.repository';
import { findStaffIdForUser } from '../bookings/salon-resources.repository';
import { todayIn } from '../bookings/day-view.service';
import { deskBookingView } from '../bookings/booking-view.service';
import { listWindowViews } from './windows.service';
import { fillWindow } from './fill-window.service';
import { acceptOffer, offerWindow, viewOffer } from './window-offers.service';

export function registerWindowRoutes({ table, db, mailer, sms, config }: AppDeps): void {
  apiRoute(
    table,
    { method: 'get', path: apiPaths.windows, access: STAFF, summary: "A day's hands-free windows with the fits and standby clients for each", query: WindowsQuerySchema, response: WindowListSchema },
    async ({ user, query }) => {
      const salon = await findSalon(db, user.salonId);
      // A stylist sees their own windows; the desk and owner any stylist's.
      const stylistId = user.role === 'stylist' ? ((await findStaffIdForUser(db, user.id)) ?? 'none') : query.stylistId;
      return { timeZone: salon.timeZone, ...(await listWindowViews(db, salon, query.date ?? todayIn(salon.timeZone), stylistId, new Date())) };
    },
  );
  apiRoute(
    table,
    { method: 'post', path: apiPaths.fillWindow, access: STAFF, summary: 'Book a walk-in or standby client into a hands-free window', body: FillWindowSchema, response: BookingViewSchema, status: 201 },
    async ({ user, body }) => {
      const salon = await findSalon(db, user.salonId);
      const id = await fillWindow(db, salon, user, body, new Date());
      return deskBookingView(db, salon.id, salon.timeZone, id);
    },
  );
  apiRoute(
    table,
    { method: 'post', path: apiPaths.offerWindow, access: STAFF, summary: 'Offer a window to standby clients by SMS and e-mail', body: OfferWindowSchema, response: z.object({ offers: z.number() }), status: 201 },
    async ({ user, body, req }) => {
      const salon = await findSalon(db, user.salonId);
      return offerWindow(db, { mailer, sms }, salon, user, body, config.publicUrl ?? `${req.protocol}://${req.get('host')}`);
    },
  );
  apiRoute(
    table,
    { method: 'get', path: '/api/offers/:token', access: 'public', summary: 'A window offer as its link shows it', params: OfferTokenParamsSchema, response: OfferViewSchema },
    async ({ params }) => viewOffer(db, params.token),
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/offers/:token/accept', access: 'public', summary: 'Take an offered window (first to accept wins)', params: OfferTokenParamsSchema, response: OfferViewSchema },
    async ({ params }) => acceptOffer(db, { mailer, sms }, params.token, new Date()),
  );
}
