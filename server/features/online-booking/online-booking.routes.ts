import { onlineBookingApi } from '@shared/api/online-booking.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { rateLimited } from '@server/lib/rate-limit';
import { publicSalon } from './public-salon.service';
import { cachedFreeTimes } from './free-times.service';
import { acceptCautions, claimHold, createHold, holdStatus } from './holds.service';
import { myOpenHolds, releaseHold, resumeHold } from './open-holds.service';
import { payHold } from './pay-hold.service';

export function registerOnlineBookingRoutes({ table, db, jobs, payments, mailer, sms, readCache, config }: AppDeps): void {
  const limited = (name: string, limit: number) =>
    rateLimited(db, { name, windowMs: 60_000, limit, message: 'Too many requests; wait a minute and try again.' });
  apiRoute(table, onlineBookingApi.publicSalon, ({ params }) => publicSalon(db, params.slug));
  apiRoute(table, onlineBookingApi.availability, ({ params, query }) => cachedFreeTimes(db, readCache, params.slug, query, new Date()), [
    limited('free-times', 60),
  ]);
  // Public, but a signed-in client who already holds a time is sent back to it (one open hold per client).
  apiRoute(table, onlineBookingApi.createHold, ({ user, body }) => createHold(db, jobs, user, body, new Date()), [limited('holds', 20)]);
  apiRoute(table, onlineBookingApi.hold, ({ params }) => holdStatus(db, params.id, new Date()));
  apiRoute(table, onlineBookingApi.myHolds, async ({ user }) => ({ holds: await myOpenHolds(db, user, new Date()) }));
  apiRoute(table, onlineBookingApi.resumeHold, ({ user, params }) => resumeHold(db, user, params.id, new Date()));
  apiRoute(table, onlineBookingApi.releaseHold, ({ user, params, body }) => releaseHold(db, user, params.id, body.secret, new Date()));
  apiRoute(table, onlineBookingApi.claimHold, ({ user, params, body }) => claimHold(db, user, params.id, body.secret, new Date()));
  apiRoute(table, onlineBookingApi.acceptCautions, ({ user, params, body }) => acceptCautions(db, user, params.id, body.secret, body.version, new Date()));
  apiRoute(table, onlineBookingApi.payHold, ({ user, params, body, req }) =>
    payHold(db, { payments, mailer, sms }, user, params.id, body.secret, config.publicUrl ?? `${req.protocol}://${req.get('host')}`, new Date()),
  );
}
