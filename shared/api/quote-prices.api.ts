import { QuotePricesSchema } from '../schemas/quote-prices.schemas';
import { endpoint } from './endpoint';

/** What quotes and mix logs are priced from. Only the owner sets prices; stylists and the desk see their effect. */
export const quotePricesApi = {
  current: endpoint({
    method: 'get',
    path: '/api/owner/quote-prices',
    access: ['owner'],
    summary: 'The hourly correction rate and product cost per gram per product type',
    response: QuotePricesSchema,
  }),
  save: endpoint({
    method: 'put',
    path: '/api/owner/quote-prices',
    access: ['owner'],
    summary: 'Set the hourly correction rate and product costs per gram',
    body: QuotePricesSchema,
    response: QuotePricesSchema,
  }),
};
