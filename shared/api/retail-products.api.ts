import { IdParamsSchema } from '../schemas/common.schemas';
import { RetailProductChangeSchema, RetailProductInputSchema, RetailProductListSchema, RetailProductSchema } from '../schemas/retail-product.schemas';
import { DESK, endpoint } from './endpoint';

/** The retail products the owner keeps; the desk reads them to sell at checkout. */
export const retailProductsApi = {
  list: endpoint({
    method: 'get',
    path: '/api/retail-products',
    access: DESK,
    summary: 'Every retail product, on sale first, with its price and stock',
    response: RetailProductListSchema,
  }),
  add: endpoint({
    method: 'post',
    path: '/api/owner/retail-products',
    access: ['owner'],
    summary: 'Add a retail product',
    body: RetailProductInputSchema,
    response: RetailProductSchema,
    status: 201,
  }),
  change: endpoint({
    method: 'put',
    path: '/api/owner/retail-products/:id',
    access: ['owner'],
    summary: "Change a retail product's name, price or stock count, or retire it (or put it back on sale)",
    params: IdParamsSchema,
    body: RetailProductChangeSchema,
    response: RetailProductSchema,
  }),
};
