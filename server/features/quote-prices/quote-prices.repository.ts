import type { Db } from '@server/db/database';
import type { CostedProduct } from '@shared/schemas/mix-log.schemas';

/** The owner's estimated cost per gram of each product type and of developer (those not set are absent). */
export async function productCentsPerGram(db: Db, salonId: string): Promise<Partial<Record<CostedProduct, number>>> {
  const rows = await db.selectFrom('product_costs').select(['product_type', 'cents_per_gram']).where('salon_id', '=', salonId).execute();
  return Object.fromEntries(rows.map((r) => [r.product_type, Number(r.cents_per_gram)]));
}

export async function correctionRate(db: Db, salonId: string): Promise<number> {
  const row = await db.selectFrom('salons').select('correction_cents_per_hour').where('id', '=', salonId).executeTakeFirstOrThrow();
  return row.correction_cents_per_hour;
}

/** Replaces the salon's quote prices in one go (a type left out has no cost set). */
export async function saveQuotePrices(
  db: Db,
  salonId: string,
  prices: { correctionCentsPerHour: number; productCentsPerGram: Partial<Record<CostedProduct, number>> },
) {
  await db.updateTable('salons').set({ correction_cents_per_hour: prices.correctionCentsPerHour }).where('id', '=', salonId).execute();
  await db.deleteFrom('product_costs').where('salon_id', '=', salonId).execute();
  const rows = Object.entries(prices.productCentsPerGram)
    .filter(([, cents]) => cents !== undefined)
    .map(([type, cents]) => ({ salon_id: salonId, product_type: type as CostedProduct, cents_per_gram: cents! }));
  if (rows.length) await db.insertInto('product_costs').values(rows).execute();
}
