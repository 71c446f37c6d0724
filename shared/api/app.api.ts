import { z } from 'zod';
import { endpoint } from './endpoint';

const HealthSchema = z.object({ ok: z.boolean(), db: z.enum(['up', 'down']) });

/** The app itself: whether it is up, and the description of its API. */
export const appApi = {
  health: endpoint({ method: 'get', path: '/api/health', access: 'public', summary: 'Is the app and its database up', response: HealthSchema }),
  // The document is generated from every endpoint's contract, so it has no schema of its own here.
  openapi: endpoint({ method: 'get', path: '/api/openapi.json', access: 'public', summary: 'This OpenAPI document', answers: 'json' }),
};
