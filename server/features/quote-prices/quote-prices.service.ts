import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { QuotePrices } from '@shared/schemas/quote-prices.schemas';
import type { Db } from '@server/db/database';
import { correctionRate, productCentsPerGram, saveQuotePrices } from './quote-prices.repository';

export async function quotePrices(db: Db, user: SessionUser): Promise<QuotePrices> {
  return { correctionCentsPerHour: await correctionRate(db, user.salonId), productCentsPerGram: await productCentsPerGram(db, user.salonId) };
}

/** Replaces the rate and every product cost at once (a type left out has no cost set), then answers what is stored. */
export async function setQuotePrices(db: Db, user: SessionUser, prices: QuotePrices): Promise<QuotePrices> {
  await db.transaction().execute((trx) => saveQuotePrices(trx, user.salonId, prices));
  return quotePrices(db, user);
}
