import { SalonSchema } from '../schemas/salon.schemas';
import { endpoint } from './endpoint';

/** The salon the signed-in user belongs to. */
export const salonApi = {
  current: endpoint({ method: 'get', path: '/api/salon', access: 'signed_in', summary: "The signed-in user's salon", response: SalonSchema }),
};
