import { ServiceListSchema, StylistListSchema } from '../schemas/service.schemas';
import { STAFF, endpoint } from './endpoint';

/** The salon's menu and team as its staff read them on most desk pages (set-up edits them elsewhere). */
export const catalogueApi = {
  services: endpoint({
    method: 'get',
    path: '/api/services',
    access: STAFF,
    summary: "The salon's services with their step plans",
    response: ServiceListSchema,
  }),
  stylists: endpoint({ method: 'get', path: '/api/stylists', access: STAFF, summary: "The salon's stylists with skills", response: StylistListSchema }),
};
