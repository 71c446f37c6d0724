import { IdParamsSchema } from '../schemas/common.schemas';
import { CreateStandbySchema, StandbyEntrySchema, StandbyListSchema } from '../schemas/standby.schemas';
import { DESK, STAFF, endpoint } from './endpoint';

/** The standby list: clients who can come at short notice, offered hands-free windows as they open. */
export const standbyApi = {
  list: endpoint({ method: 'get', path: '/api/standby', access: STAFF, summary: 'The standby list', response: StandbyListSchema }),
  add: endpoint({
    method: 'post',
    path: '/api/standby',
    access: DESK,
    summary: 'Add a client to the standby list',
    body: CreateStandbySchema,
    response: StandbyEntrySchema,
    status: 201,
  }),
  remove: endpoint({
    method: 'delete',
    path: '/api/standby/:id',
    access: DESK,
    summary: 'Take a client off the standby list',
    params: IdParamsSchema,
    status: 204,
  }),
};
