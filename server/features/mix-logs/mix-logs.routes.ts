import { mixLogsApi } from '@shared/api/mix-logs.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { mixLogList, repeatMixLog, writeMixLog } from './mix-logs.service';

// Desk, owner and stylists may call these; the service narrows a stylist to the bookings they work on.
export function registerMixLogRoutes({ table, db }: AppDeps): void {
  apiRoute(table, mixLogsApi.list, ({ user, params }) => mixLogList(db, user, params.id, new Date()));
  apiRoute(table, mixLogsApi.write, ({ user, params, body }) => writeMixLog(db, user, params.id, body));
  apiRoute(table, mixLogsApi.repeat, ({ user, params, body }) => repeatMixLog(db, user, params.id, body));
}
