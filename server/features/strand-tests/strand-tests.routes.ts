import { IdParamsSchema } from '../../../shared/schemas/common.schemas';
import { RecordStrandTestSchema, StrandTestListSchema, StrandTestSchema, type StrandTest } from '../../../shared/schemas/strand-test.schemas';
import type { AppDeps } from '../../app-deps';
import { STAFF } from '../../auth/require-access';
import { apiRoute } from '../../lib/api-route';
import { invalidField, notFound } from '../../lib/app-error';
import { writeAudit } from '../audit/audit.repository';
import { findClient } from '../clients/clients.repository';
import { checkStrength } from '../mix-logs/mix-logs.service';
import { clientPhotoIds } from '../consultations/consultations.repository';
import { insertStrandTest, listStrandTests, type StrandTestRow } from './strand-tests.repository';

const toView = (r: StrandTestRow): StrandTest => ({
  id: r.id, testedAt: r.tested_at.toISOString(), tested: r.tested, productType: r.product_type,
  developerPercent: r.developer_percent === null ? null : Number(r.developer_percent), minutes: r.minutes, result: r.result, notes: r.notes,
  photoId: r.photo_id, recordedByName: r.recorded_by_name,
});

export function registerStrandTestRoutes({ table, db }: AppDeps): void {
  apiRoute(
    table,
    { method: 'get', path: '/api/clients/:id/strand-tests', access: STAFF, summary: "A client's strand tests, newest first", params: IdParamsSchema, response: StrandTestListSchema },
    async ({ user, params }) => {
      if (!(await findClient(db, user.salonId, params.id))) throw notFound('That client');
      return { tests: (await listStrandTests(db, user.salonId, params.id)).map(toView) };
    },
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/clients/:id/strand-tests', access: STAFF, summary: 'Record a strand test', params: IdParamsSchema, body: RecordStrandTestSchema, response: StrandTestSchema, status: 201 },
    async ({ user, params, body }) => {
      if (!(await findClient(db, user.salonId, params.id))) throw notFound('That client');
      if (body.developerPercent !== null) {
        const salon = await db.selectFrom('salons').select('max_developer_percent').where('id', '=', user.salonId).executeTakeFirstOrThrow();
        checkStrength(body.developerPercent, Number(salon.max_developer_percent), 'developerPercent');
      }
      if (body.photoId && (await clientPhotoIds(db, params.id, [body.photoId])).length === 0) throw invalidField('photoId', 'Pick one of this client’s photos.');
      return db.transaction().execute(async (trx) => {
        const id = await insertStrandTest(trx, { ...body, salonId: user.salonId, clientId: params.id, recordedBy: user.id });
        const test = toView((await listStrandTests(trx, user.salonId, params.id)).find((t) => t.id === id)!);
        await writeAudit(trx, { salonId: user.salonId, actorUserId: user.id, entity: 'strand_test', entityId: id, action: 'recorded', after: test });
        return test;
      });
    },
  );
}
