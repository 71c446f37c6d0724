import { retailProductsApi } from '@shared/api/retail-products.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { addRetailProduct, changeRetailProduct, retailProducts } from './retail-products.service';

export function registerRetailProductRoutes({ table, db }: AppDeps): void {
  apiRoute(table, retailProductsApi.list, ({ user }) => retailProducts(db, user.salonId));
  apiRoute(table, retailProductsApi.add, ({ user, body }) => addRetailProduct(db, user, body));
  apiRoute(table, retailProductsApi.change, ({ user, params, body }) => changeRetailProduct(db, user, params.id, body));
}
