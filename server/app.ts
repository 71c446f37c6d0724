import path from 'node:path';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import express, { Router } from 'express';
import helmet from 'helmet';
import cookieParser from 'cookie-parser';
import { OpenAPIRegistry, OpenApiGeneratorV3 } from '@asteasolutions/zod-to-openapi';
import type { AppDeps } from './app-deps';
import { apiRoute, type RouteTable } from './lib/api-route';
import { appApi } from '../shared/api/app.api';
import { API_ROOT } from '../shared/api/endpoint';
import { apiNotFound, errorHandler } from './lib/error-handler';
import { configureLogger } from './lib/logger';
import { installRequestLog } from './lib/request-log';
import { compress } from './lib/compress';
import { installTestClock } from './lib/request-clock';
import { serveClient } from './lib/static-client';
import { installSessions } from './auth/sessions';
import { installCsrf } from './auth/csrf';
import { registerHealthRoutes } from './features/health/health.routes';
import { registerSessionRoutes } from './features/session/session.routes';
import { registerPasswordResetRoutes } from './features/password-reset/password-reset.routes';
import { registerSalonRoutes } from './features/salon/salon.routes';
import { registerBookingRoutes } from './features/bookings/bookings.routes';
import { registerClientRoutes } from './features/clients/clients.routes';
import { registerClientAgeRoutes } from './features/clients/client-age.routes';
import { registerMailboxRoutes } from './features/mailbox/mailbox.routes';
import { registerOwnerRoutes } from './features/owner/owner.routes';
import { registerBookingChangeRoutes } from './features/bookings/booking-changes.routes';
import { registerDayOfServiceRoutes } from './features/day-of-service/day-of-service.routes';
import { registerReplanRoutes } from './features/replan/replan.routes';
import { registerServiceRoutes } from './features/services/services.routes';
import { registerTypicalMinutesRoutes } from './features/typical-minutes/typical-minutes.routes';
import { registerSkinTestRoutes } from './features/skin-tests/skin-tests.routes';
import { registerStandbyRoutes } from './features/standby/standby.routes';
import { registerWindowRoutes } from './features/windows/windows.routes';
import { registerOnlineBookingRoutes } from './features/online-booking/online-booking.routes';
import { registerMyBookingRoutes } from './features/online-booking/my-bookings.routes';
import { registerHairHistoryRoutes } from './features/hair-history/hair-history.routes';
import { registerPhotoRoutes } from './features/photos/photos.routes';
import { registerMixLogRoutes } from './features/mix-logs/mix-logs.routes';
import { registerUtilisationRoutes } from './features/utilisation/utilisation.routes';
import { registerSalonSettingsRoutes } from './features/setup/salon-settings.routes';
import { registerStaffSetupRoutes } from './features/setup/staff-setup.routes';
import { registerUnitSetupRoutes } from './features/setup/units-setup.routes';
import { registerServiceSetupRoutes } from './features/setup/services-setup.routes';
import { registerConsultationRoutes } from './features/consultations/consultations.routes';
import { registerStrandTestRoutes } from './features/strand-tests/strand-tests.routes';
import { registerQuotePriceRoutes } from './features/quote-prices/quote-prices.routes';
import { registerRetailProductRoutes } from './features/retail-products/retail-products.routes';
import { registerMessageRoutes } from './features/messages/messages.routes';
import { registerPaymentRoutes } from './features/payments';
import { registerTakingsRoutes } from './features/takings/takings.routes';
import { createLiveHub, registerLiveEventRoutes } from './features/live-events';
import { createDiskStorage } from './storage/disk-storage';
import { createReadCache } from './lib/read-cache';

const clientDist = path.join(path.dirname(fileURLToPath(import.meta.url)), '..', 'dist', 'client');

/** Builds the Express app without listening, so tests mount it in-process. */
export function createApp(deps: Omit<AppDeps, 'table' | 'storage' | 'readCache' | 'liveHub'> & { storage?: AppDeps['storage'] }) {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', deps.config.trustProxy);
  configureLogger(deps.config);
  installRequestLog(app);
  app.use(compress());
  app.use(
    helmet({
      contentSecurityPolicy: {
        // Fonts are bundled with the client (assets/): none from elsewhere, none inlined.
        directives: { 'script-src': ["'self'"], 'style-src': ["'self'", "'unsafe-inline'"], 'img-src': ["'self'", 'data:', 'blob:'], 'font-src': ["'self'"] },
      },
      // HTTPS only, for a year, wherever cookies are Secure (production); never on plain-http local development.
      strictTransportSecurity: deps.config.secureCookies ? { maxAge: 31_536_000, includeSubDomains: true } : false,
    }),
  );
  app.use(API_ROOT, express.json({ limit: '100kb', strict: true }));
  app.use(cookieParser());
  installSessions(app, deps);
  installTestClock(app, deps.config.mode);

  // Answers are checked against their contracts everywhere but production, where a slip costs a parse per answer.
  const table: RouteTable = { router: Router(), registry: new OpenAPIRegistry(), records: [], checkResponses: deps.config.mode !== 'production' };
  installCsrf(app, deps.config, table);
  const liveHub = createLiveHub({ databaseUrl: deps.config.databaseUrl, maxStreams: deps.config.maxLiveStreams });
  const full: AppDeps = { ...deps, storage: deps.storage ?? createDiskStorage(deps.config.uploadsDir), readCache: createReadCache(), table, liveHub };
  for (const register of [
    registerHealthRoutes,
    registerSessionRoutes,
    registerPasswordResetRoutes,
    registerSalonRoutes,
    registerBookingRoutes,
    registerBookingChangeRoutes,
    registerDayOfServiceRoutes,
    registerReplanRoutes,
    registerServiceRoutes,
    registerTypicalMinutesRoutes,
    registerClientAgeRoutes,
    registerSkinTestRoutes,
    registerStandbyRoutes,
    registerWindowRoutes,
    registerOnlineBookingRoutes,
    registerMyBookingRoutes,
    registerClientRoutes,
    registerOwnerRoutes,
    registerMailboxRoutes,
    registerHairHistoryRoutes,
    registerPhotoRoutes,
    registerMixLogRoutes,
    registerUtilisationRoutes,
    registerSalonSettingsRoutes,
    registerStaffSetupRoutes,
    registerUnitSetupRoutes,
    registerServiceSetupRoutes,
    registerConsultationRoutes,
    registerStrandTestRoutes,
    registerQuotePriceRoutes,
    registerRetailProductRoutes,
    registerMessageRoutes,
    registerPaymentRoutes,
    registerTakingsRoutes,
    registerLiveEventRoutes,
  ]) {
    register(full);
  }
  // Generated at the first request, when every route (this one too) is registered.
  let openapi: unknown;
  apiRoute(
    table,
    appApi.openapi,
    async () =>
      (openapi ??= new OpenApiGeneratorV3(table.registry.definitions).generateDocument({ openapi: '3.0.3', info: { title: 'Dwell API', version: '1' } })),
  );
  app.use(table.router);
  app.use(API_ROOT, apiNotFound);

  if (existsSync(clientDist)) serveClient(app, clientDist);
  app.use(errorHandler);
  // Named apiRoutes: Express's own typings already declare a loosely typed `routes`. shutdown() lets go of what the
  // app holds open besides the pool it was given (the live streams' LISTEN connection); liveStreams() counts them.
  return Object.assign(app, { apiRoutes: table.records, shutdown: () => liveHub.stop(), liveStreams: () => liveHub.size() });
}
