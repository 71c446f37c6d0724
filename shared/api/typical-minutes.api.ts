import { IdParamsSchema } from '../schemas/common.schemas';
import { TypicalMinutesQuerySchema, TypicalMinutesSchema } from '../schemas/typical-minutes.schemas';
import { endpoint } from './endpoint';

/** Plan vs actual: how long a service's steps really take, as a suggestion beside the planned minutes. */
export const typicalMinutesApi = {
  forService: endpoint({
    method: 'get',
    path: '/api/services/:id/typical-minutes',
    // Per-stylist timing is a staff matter: the owner sees every stylist, a stylist the salon and themselves.
    access: ['stylist', 'owner'],
    summary: 'Typical actual minutes of each step of a service (median and 80th percentile over the last 20 finished visits), for the salon and per stylist',
    params: IdParamsSchema,
    query: TypicalMinutesQuerySchema,
    response: TypicalMinutesSchema,
  }),
};
