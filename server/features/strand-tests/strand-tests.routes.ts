import { testRecordsApi } from '@shared/api/test-records.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { recordStrandTest, strandTestsOf } from './strand-tests.service';

export function registerStrandTestRoutes({ table, db }: AppDeps): void {
  apiRoute(table, testRecordsApi.strandTests, ({ user, params }) => strandTestsOf(db, user, params.id));
  apiRoute(table, testRecordsApi.recordStrandTest, ({ user, params, body }) => recordStrandTest(db, user, params.id, body));
}
