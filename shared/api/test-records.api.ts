import { IdParamsSchema } from '../schemas/common.schemas';
import {
  RecordClearanceSchema,
  RecordSkinTestReadingSchema,
  RecordSkinTestSchema,
  SkinTestClearanceSchema,
  SkinTestListSchema,
  SkinTestReadingParamsSchema,
  SkinTestSchema,
} from '../schemas/skin-test.schemas';
import { RecordStrandTestSchema, StrandTestListSchema, StrandTestSchema } from '../schemas/strand-test.schemas';
import { STAFF, endpoint } from './endpoint';

/**
 * A client's test records, kept by the salon's team: skin tests (with their readings and the owner's clearances)
 * and strand tests. Both kinds are a list newest first and a record that is written once (docs/records.md).
 */
export const testRecordsApi = {
  skinTests: endpoint({
    method: 'get',
    path: '/api/clients/:id/skin-tests',
    access: STAFF,
    summary: "A client's skin tests, newest first",
    params: IdParamsSchema,
    response: SkinTestListSchema,
  }),
  recordSkinTest: endpoint({
    method: 'post',
    path: '/api/clients/:id/skin-tests',
    access: STAFF,
    summary: 'Record a skin test (applied, or applied and read)',
    params: IdParamsSchema,
    body: RecordSkinTestSchema,
    response: SkinTestSchema,
    status: 201,
  }),
  recordSkinTestReading: endpoint({
    method: 'post',
    path: '/api/clients/:id/skin-tests/:testId/reading',
    access: STAFF,
    summary: 'Record the reading of a skin test that was applied and not yet read (once; audited)',
    params: SkinTestReadingParamsSchema,
    body: RecordSkinTestReadingSchema,
    response: SkinTestSchema,
  }),
  recordClearance: endpoint({
    method: 'post',
    path: '/api/clients/:id/skin-test-clearances',
    access: ['owner'],
    summary: "The owner's clearance that lets oxidative colour follow a positive skin test (who, when, why; kept and audited)",
    params: IdParamsSchema,
    body: RecordClearanceSchema,
    response: SkinTestClearanceSchema,
    status: 201,
  }),
  strandTests: endpoint({
    method: 'get',
    path: '/api/clients/:id/strand-tests',
    access: STAFF,
    summary: "A client's strand tests, newest first",
    params: IdParamsSchema,
    response: StrandTestListSchema,
  }),
  recordStrandTest: endpoint({
    method: 'post',
    path: '/api/clients/:id/strand-tests',
    access: STAFF,
    summary: 'Record a strand test',
    params: IdParamsSchema,
    body: RecordStrandTestSchema,
    response: StrandTestSchema,
    status: 201,
  }),
};
