import { OwnerOverviewSchema } from '../schemas/owner.schemas';
import { endpoint } from './endpoint';

/** The owner's home page. */
export const ownerApi = {
  overview: endpoint({
    method: 'get',
    path: '/api/owner/overview',
    access: ['owner'],
    summary: 'What the salon has and how this week is used',
    response: OwnerOverviewSchema,
  }),
};
