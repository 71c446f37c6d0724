import { replanApi } from '@shared/api/replan.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { applyReplanFix } from './apply-fix.service';
import { deskDayConflicts } from './replan-summary.service';
import { tellClientRunningLate } from './tell-running-late.service';

export function registerReplanRoutes({ table, db, mailer, sms }: AppDeps): void {
  apiRoute(table, replanApi.dayConflicts, ({ user, query }) => deskDayConflicts(db, user, query.date, new Date()));
  apiRoute(table, replanApi.applyFix, ({ user, params, body }) => applyReplanFix(db, { mailer, sms }, user, params.id, body.fix, new Date()));
  apiRoute(table, replanApi.tellRunningLate, ({ user, params, body }) =>
    tellClientRunningLate(db, { mailer, sms }, user, params.id, Number(params.n), body.minutesLate, new Date()),
  );
}
