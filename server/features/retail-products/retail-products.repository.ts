import type { Selectable } from 'kysely';
import type { Db } from '@server/db/database';
import type { RetailProductsTable } from '@server/db/schema';
import type { RetailProduct, RetailProductInput } from '@shared/schemas/retail-product.schemas';

const toProduct = (r: Selectable<RetailProductsTable>): RetailProduct => ({
  id: r.id,
  name: r.name,
  priceCents: r.price_cents,
  stock: r.stock,
  active: r.active,
});

/** Every product of the salon, those on sale first, then by name. */
export async function listRetailProducts(db: Db, salonId: string): Promise<RetailProduct[]> {
  const rows = await db.selectFrom('retail_products').selectAll().where('salon_id', '=', salonId).orderBy('active', 'desc').orderBy('name').execute();
  return rows.map(toProduct);
}

export async function findRetailProduct(db: Db, salonId: string, id: string): Promise<RetailProduct | undefined> {
  const row = await db.selectFrom('retail_products').selectAll().where('id', '=', id).where('salon_id', '=', salonId).executeTakeFirst();
  return row && toProduct(row);
}

export async function insertRetailProduct(db: Db, salonId: string, p: RetailProductInput): Promise<RetailProduct> {
  const row = await db
    .insertInto('retail_products')
    .values({ salon_id: salonId, name: p.name, price_cents: p.priceCents, stock: p.stock })
    .returningAll()
    .executeTakeFirstOrThrow();
  return toProduct(row);
}

/** Name, price and whether it is on sale; the stock is written apart (setStockCount, takeFromStock). */
export async function updateRetailProduct(db: Db, salonId: string, id: string, p: { name: string; priceCents: number; active: boolean }): Promise<void> {
  await db
    .updateTable('retail_products')
    .set({ name: p.name, price_cents: p.priceCents, active: p.active })
    .where('id', '=', id)
    .where('salon_id', '=', salonId)
    .execute();
}

/** A counted stock, written only while the stock is still `seen`; false when a sale moved it meanwhile. */
export async function setStockCount(db: Db, salonId: string, id: string, seen: number, count: number): Promise<boolean> {
  const r = await db
    .updateTable('retail_products')
    .set({ stock: count })
    .where('id', '=', id)
    .where('salon_id', '=', salonId)
    .where('stock', '=', seen)
    .executeTakeFirst();
  return r.numUpdatedRows > 0n;
}

/**
 * Takes `quantity` from a product's stock in one statement, so concurrent sales can never take it below zero:
 * the row lock makes each wait for the one before and re-check `stock >= quantity`. Answers the stock left, or
 * null when there is not that much (nothing is taken). Checkout calls it inside its own transaction.
 */
export async function takeFromStock(db: Db, salonId: string, id: string, quantity: number): Promise<number | null> {
  const row = await db
    .updateTable('retail_products')
    .set((eb) => ({ stock: eb('stock', '-', quantity) }))
    .where('id', '=', id)
    .where('salon_id', '=', salonId)
    .where('stock', '>=', quantity)
    .returning('stock')
    .executeTakeFirst();
  return row ? row.stock : null;
}
