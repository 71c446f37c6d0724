import { apiPaths } from '../../../shared/api/api-paths';
import {
  AcceptCautionsSchema, AvailabilityQuerySchema, AvailabilitySchema, ClaimedHoldSchema, CreatedHoldSchema, CreateHoldSchema,
  HoldParamsSchema, HoldSchema, HoldSecretSchema, MyHoldsSchema, PayHoldSchema, PublicSalonSchema, ReleaseHoldSchema, ResumedHoldSchema,
  ResumeHoldSchema, SlugParamsSchema,
} from '../../../shared/schemas/online-booking.schemas';
import { BookingViewSchema } from '../../../shared/schemas/booking-view.schemas';
import type { AppDeps } from '../../app-deps';
import { apiRoute } from '../../lib/api-route';
import { rateLimited } from '../../lib/rate-limit';
import { notFound } from '../../lib/app-error';
import { deskBookingView } from '../bookings/booking-changes.routes';
import { publicSalon } from './public-salon.service';
import { freeTimes, freeTimesDays, freeTimesKey, onlineService } from './availability.service';
import { salonAtBookVersion } from '../book-version/book-version.repository';
import { cachedBookRead } from '../book-version/cached-book-read';
import { acceptCautions, claimHold, createHold } from './holds.service';
import { holdLapsed, holdView } from './hold-view';
import { myOpenHolds, releaseHold, resumeHold } from './open-holds.service';
import { findHold } from './holds.repository';
import { payHold } from './pay-hold.service';

const limited = (limit: number) => rateLimited({ windowMs: 60_000, limit, message: 'Too many requests; wait a minute and try again.' });

export function registerOnlineBookingRoutes({ table, db, jobs, payments, mailer, sms, readCache }: AppDeps): void {
  apiRoute(table, { method: 'get', path: '/api/public/salons/:slug', access: 'public', summary: "The salon's public page", params: SlugParamsSchema, response: PublicSalonSchema }, async ({ params }) =>
    publicSalon(db, params.slug),
  );
  table.router.get('/api/public/salons/:slug/availability', limited(60));
  apiRoute(
    table,
    { method: 'get', path: '/api/public/salons/:slug/availability', access: 'public', summary: 'Free times for an online-bookable service', params: SlugParamsSchema, query: AvailabilityQuerySchema, response: AvailabilitySchema },
    async ({ params, query }) => {
      const now = new Date();
      const at = await salonAtBookVersion(db, { slug: params.slug }, (zone) => freeTimesDays(zone, query.from, now));
      // The service is checked inside: a refusal (not online, not found) is not cached, and services are part of the version.
      return cachedBookRead(readCache, at, freeTimesKey(at.salon, query.serviceId, query.stylistId, query.from, now), async () =>
        freeTimes(db, at.salon, await onlineService(db, at.salon.id, query.serviceId), query.stylistId, query.from, now),
      );
    },
  );
  table.router.post(apiPaths.holds, limited(20));
  apiRoute(table, { method: 'post', path: apiPaths.holds, access: 'public', summary: 'Hold a time for a few minutes', body: CreateHoldSchema, response: CreatedHoldSchema, status: 201 }, async ({ user, body }) =>
    // Public, but a signed-in client who already holds a time is sent back to it (one open hold per client).
    createHold(db, jobs, user, body, new Date()),
  );
  apiRoute(table, { method: 'get', path: '/api/public/holds/:id', access: 'public', summary: 'Where a hold stands', params: HoldParamsSchema, response: HoldSchema }, async ({ params }) => {
    const hold = await findHold(db, params.id);
    if (!hold) throw holdLapsed();
    return holdView(hold);
  });
  apiRoute(table, { method: 'get', path: apiPaths.myHolds, access: ['client'], summary: 'My unpaid held time, if any', response: MyHoldsSchema }, async ({ user }) => ({
    holds: await myOpenHolds(db, user, new Date()),
  }));
  apiRoute(
    table,
    { method: 'post', path: '/api/me/holds/:id/resume', access: ['client'], summary: 'Go back to booking my held time', params: HoldParamsSchema, body: ResumeHoldSchema, response: ResumedHoldSchema },
    async ({ user, params }) => resumeHold(db, user, params.id, new Date()),
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/me/holds/:id/release', access: ['client'], summary: 'Release my held time at once', params: HoldParamsSchema, body: ReleaseHoldSchema, status: 204 },
    async ({ user, params, body }) => releaseHold(db, user, params.id, body.secret, new Date()),
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/me/holds/:id/claim', access: ['client'], summary: 'Take a hold as the signed-in client', params: HoldParamsSchema, body: HoldSecretSchema, response: ClaimedHoldSchema },
    async ({ user, params, body }) => claimHold(db, user, params.id, body.secret, new Date()),
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/me/holds/:id/cautions', access: ['client'], summary: 'Accept the cautions for a hold', params: HoldParamsSchema, body: AcceptCautionsSchema, status: 204 },
    async ({ user, params, body }) => acceptCautions(db, user, params.id, body.secret, body.version, new Date()),
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/me/holds/:id/pay', access: ['client'], summary: 'Pay the deposit; the hold becomes a booking', params: HoldParamsSchema, body: PayHoldSchema, response: BookingViewSchema },
    async ({ user, params, body }) => {
      const id = await payHold(db, { payments, mailer, sms }, user, params.id, body, new Date());
      const hold = await findHold(db, id);
      if (!hold) throw notFound('That booking');
      return deskBookingView(db, hold.salon_id, hold.timeZone, id);
    },
  );
}
