import { QuotePricesSchema } from '../../../shared/schemas/quote-prices.schemas';
import type { AppDeps } from '../../app-deps';
import { apiRoute } from '../../lib/api-route';
import { correctionRate, productCentsPerGram, saveQuotePrices } from './quote-prices.repository';

const read = async (db: AppDeps['db'], salonId: string) => ({
  correctionCentsPerHour: await correctionRate(db, salonId),
  productCentsPerGram: await productCentsPerGram(db, salonId),
});

// Only the owner sets prices; stylists and the desk see their effect in quotes and mix logs.
export function registerQuotePriceRoutes({ table, db }: AppDeps): void {
  apiRoute(
    table,
    { method: 'get', path: '/api/owner/quote-prices', access: ['owner'], summary: 'The hourly correction rate and product cost per gram per product type', response: QuotePricesSchema },
    ({ user }) => read(db, user.salonId),
  );
  apiRoute(
    table,
    { method: 'put', path: '/api/owner/quote-prices', access: ['owner'], summary: 'Set the hourly correction rate and product costs per gram', body: QuotePricesSchema, response: QuotePricesSchema },
    async ({ user, body }) => {
      await db.transaction().execute((trx) => saveQuotePrices(trx, user.salonId, body));
      return read(db, user.salonId);
    },
  );
}
