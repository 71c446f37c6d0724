import { testRecordsApi } from '@shared/api/test-records.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { recordSkinTest, recordSkinTestReading, skinTestsOf } from './skin-tests.service';
import { recordClearance } from './skin-test-clearances.service';

export function registerSkinTestRoutes({ table, db }: AppDeps): void {
  apiRoute(table, testRecordsApi.skinTests, ({ user, params }) => skinTestsOf(db, user, params.id));
  apiRoute(table, testRecordsApi.recordSkinTest, ({ user, params, body }) => recordSkinTest(db, user, params.id, body, new Date()));
  apiRoute(table, testRecordsApi.recordSkinTestReading, ({ user, params, body }) =>
    recordSkinTestReading(db, user, { clientId: params.id, testId: params.testId }, body, new Date()),
  );
  apiRoute(table, testRecordsApi.recordClearance, ({ user, params, body }) => recordClearance(db, user, params.id, body.reason, new Date()));
}
