import { offersApi, windowsApi } from '@shared/api/windows.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { windowsForStaff } from './staff-windows.service';
import { fillWindow } from './fill-window.service';
import { acceptOffer, offerWindow, viewOffer } from './window-offers.service';

export function registerWindowRoutes({ table, db, mailer, sms, config }: AppDeps): void {
  apiRoute(table, windowsApi.list, ({ user, query }) => windowsForStaff(db, user, query, new Date()));
  apiRoute(table, windowsApi.fill, ({ user, body }) => fillWindow(db, user, body, new Date()));
  // The offer's link points at this server unless a public address is configured.
  apiRoute(table, windowsApi.offer, ({ user, body, req }) =>
    offerWindow(db, { mailer, sms }, user, body, config.publicUrl ?? `${req.protocol}://${req.get('host')}`),
  );
  apiRoute(table, offersApi.view, ({ params }) => viewOffer(db, params.token));
  apiRoute(table, offersApi.accept, ({ params }) => acceptOffer(db, { mailer, sms }, params.token, new Date()));
}
