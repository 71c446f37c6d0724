import { IdParamsSchema } from '../../../shared/schemas/common.schemas';
import { RecordClearanceSchema, RecordSkinTestReadingSchema, RecordSkinTestSchema, SkinTestClearanceSchema, SkinTestListSchema, SkinTestReadingParamsSchema, SkinTestSchema } from '../../../shared/schemas/skin-test.schemas';
import type { AppDeps } from '../../app-deps';
import { STAFF } from '../../auth/require-access';
import { apiRoute } from '../../lib/api-route';
import { recordSkinTest, recordSkinTestReading, skinTestsOf } from './skin-tests.service';
import { recordClearance } from './skin-test-clearances.service';

export function registerSkinTestRoutes({ table, db }: AppDeps): void {
  apiRoute(
    table,
    { method: 'get', path: '/api/clients/:id/skin-tests', access: STAFF, summary: "A client's skin tests, newest first", params: IdParamsSchema, response: SkinTestListSchema },
    async ({ user, params }) => skinTestsOf(db, user.salonId, params.id),
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/clients/:id/skin-tests', access: STAFF, summary: 'Record a skin test (applied, or applied and read)', params: IdParamsSchema, body: RecordSkinTestSchema, response: SkinTestSchema, status: 201 },
    async ({ user, params, body }) => recordSkinTest(db, user, params.id, body, new Date()),
  );
  apiRoute(
    table,
    {
      method: 'post', path: '/api/clients/:id/skin-tests/:testId/reading', access: STAFF, summary: 'Record the reading of a skin test that was applied and not yet read (once; audited)',
      params: SkinTestReadingParamsSchema, body: RecordSkinTestReadingSchema, response: SkinTestSchema,
    },
    async ({ user, params, body }) => recordSkinTestReading(db, user, { clientId: params.id, testId: params.testId }, body, new Date()),
  );
  apiRoute(
    table,
    {
      method: 'post', path: '/api/clients/:id/skin-test-clearances', access: ['owner'],
      summary: "The owner's clearance that lets oxidative colour follow a positive skin test (who, when, why; kept and audited)",
      params: IdParamsSchema, body: RecordClearanceSchema, response: SkinTestClearanceSchema, status: 201,
    },
    async ({ user, params, body }) => recordClearance(db, user, params.id, body.reason, new Date()),
  );
}
