import { quotePricesApi } from '@shared/api/quote-prices.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { quotePrices, setQuotePrices } from './quote-prices.service';

export function registerQuotePriceRoutes({ table, db }: AppDeps): void {
  apiRoute(table, quotePricesApi.current, ({ user }) => quotePrices(db, user));
  apiRoute(table, quotePricesApi.save, ({ user, body }) => setQuotePrices(db, user, body));
}
