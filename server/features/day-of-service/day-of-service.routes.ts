import { dayOfServiceApi } from '@shared/api/day-of-service.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { makeDecidedRefunds } from '../payments';
import { arriveAtDesk, finishSittingTap, finishStepTap, noShowAtDesk, startStepTap, undoTap } from './day-of-service.service';

export function registerDayOfServiceRoutes({ table, db, payments }: AppDeps): void {
  apiRoute(table, dayOfServiceApi.arrive, ({ user, params }) => arriveAtDesk(db, user, params, new Date()));
  apiRoute(table, dayOfServiceApi.noShow, async ({ user, params }) => {
    const answer = await noShowAtDesk(db, user, params, new Date());
    await makeDecidedRefunds(db, payments); // a deposit the no-show rule refunds goes back to the card now
    return answer;
  });
  apiRoute(table, dayOfServiceApi.startStep, ({ user, params }) => startStepTap(db, user, params, new Date()));
  apiRoute(table, dayOfServiceApi.finishStep, ({ user, params }) => finishStepTap(db, user, params, new Date()));
  apiRoute(table, dayOfServiceApi.finishSitting, ({ user, params, body }) => finishSittingTap(db, user, params, body, new Date()));
  apiRoute(table, dayOfServiceApi.undo, ({ user, params }) => undoTap(db, user, params, new Date()));
}
