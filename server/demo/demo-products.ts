// The demo salon's retail shelf: a few generic aftercare products for checkout to sell (invented prices and stock).
import type { Db } from '../db/database';

const demoProducts = [
  { name: 'Bond-repair shampoo 250 ml', price_cents: 2400, stock: 12 },
  { name: 'Colour-safe conditioner 250 ml', price_cents: 2200, stock: 9 },
  { name: 'Violet toning shampoo 250 ml', price_cents: 2600, stock: 6 },
  { name: 'Heat-protect spray 150 ml', price_cents: 1950, stock: 4 },
  { name: 'Finishing oil 50 ml', price_cents: 3150, stock: 0 },
];

export async function insertDemoProducts(db: Db, salonId: string): Promise<void> {
  await db
    .insertInto('retail_products')
    .values(demoProducts.map((p) => ({ salon_id: salonId, ...p })))
    .execute();
}
