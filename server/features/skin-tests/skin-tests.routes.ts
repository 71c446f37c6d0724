import { IdParamsSchema } from '../../../shared/schemas/common.schemas';
import { RecordSkinTestSchema, SkinTestListSchema, SkinTestSchema } from '../../../shared/schemas/skin-test.schemas';
import type { AppDeps } from '../../app-deps';
import { STAFF } from '../../auth/require-access';
import { apiRoute } from '../../lib/api-route';
import { notFound } from '../../lib/app-error';
import { findClient } from '../clients/clients.repository';
import { insertSkinTest, listSkinTests } from './skin-tests.repository';

const toView = (t: Awaited<ReturnType<typeof listSkinTests>>[number]) => ({
  id: t.id,
  appliedAt: t.applied_at.toISOString(),
  readAt: t.read_at?.toISOString() ?? null,
  result: t.result,
  product: t.product,
  notes: t.notes,
  recordedByName: t.recorded_by_name,
});

export function registerSkinTestRoutes({ table, db }: AppDeps): void {
  apiRoute(
    table,
    { method: 'get', path: '/api/clients/:id/skin-tests', access: STAFF, summary: "A client's skin tests, newest first", params: IdParamsSchema, response: SkinTestListSchema },
    async ({ user, params }) => {
      if (!(await findClient(db, user.salonId, params.id))) throw notFound('That client');
      return { tests: (await listSkinTests(db, user.salonId, params.id)).map(toView) };
    },
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/clients/:id/skin-tests', access: STAFF, summary: 'Record a skin test and its reading', params: IdParamsSchema, body: RecordSkinTestSchema, response: SkinTestSchema, status: 201 },
    async ({ user, params, body }) => {
      if (!(await findClient(db, user.salonId, params.id))) throw notFound('That client');
      const { id } = await insertSkinTest(db, {
        salonId: user.salonId, clientId: params.id, appliedAt: new Date(body.appliedAt), readAt: body.readAt ? new Date(body.readAt) : null,
        result: body.result, product: body.product, notes: body.notes, recordedBy: user.id,
      });
      return toView((await listSkinTests(db, user.salonId, params.id)).find((t) => t.id === id)!);
    },
  );
}
