import { dayOfServiceApi } from '@shared/api/day-of-service.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { nowOf } from '@server/lib/request-clock';
import { makeDecidedRefunds } from '../payments';
import { arriveAtDesk, finishSittingTap, finishStepTap, noShowAtDesk, startStepTap, undoTap } from './day-of-service.service';

export function registerDayOfServiceRoutes({ table, db, payments }: AppDeps): void {
  apiRoute(table, dayOfServiceApi.arrive, ({ user, params, req }) => arriveAtDesk(db, user, params, nowOf(req)));
  apiRoute(table, dayOfServiceApi.noShow, async ({ user, params, req }) => {
    const answer = await noShowAtDesk(db, user, params, nowOf(req));
    await makeDecidedRefunds(db, payments); // a deposit the no-show rule refunds goes back to the card now
    return answer;
  });
  apiRoute(table, dayOfServiceApi.startStep, ({ user, params, req }) => startStepTap(db, user, params, nowOf(req)));
  apiRoute(table, dayOfServiceApi.finishStep, ({ user, params, req }) => finishStepTap(db, user, params, nowOf(req)));
  apiRoute(table, dayOfServiceApi.finishSitting, ({ user, params, body, req }) => finishSittingTap(db, user, params, body, nowOf(req)));
  apiRoute(table, dayOfServiceApi.undo, ({ user, params, req }) => undoTap(db, user, params, nowOf(req)));
}
