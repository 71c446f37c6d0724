import { replanApi } from '@shared/api/replan.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { nowOf } from '@server/lib/request-clock';
import { applyReplanFix } from './apply-fix.service';
import { deskDayConflicts, stylistDayRun } from './replan-summary.service';
import { tellClientRunningLate } from './tell-running-late.service';

export function registerReplanRoutes({ table, db, mailer, sms }: AppDeps): void {
  apiRoute(table, replanApi.dayConflicts, ({ user, query, req }) => deskDayConflicts(db, user, query.date, nowOf(req)));
  apiRoute(table, replanApi.stylistDayRun, ({ user, query, req }) => stylistDayRun(db, user, query.date, nowOf(req)));
  apiRoute(table, replanApi.applyFix, ({ user, params, body, req }) => applyReplanFix(db, { mailer, sms }, user, params.id, body.fix, nowOf(req)));
  apiRoute(table, replanApi.tellRunningLate, ({ user, params, body, req }) =>
    tellClientRunningLate(db, { mailer, sms }, user, params.id, Number(params.n), body.minutesLate, nowOf(req)),
  );
}
