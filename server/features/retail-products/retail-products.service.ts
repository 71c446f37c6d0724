import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { RetailProduct, RetailProductChange, RetailProductInput } from '@shared/schemas/retail-product.schemas';
import { AppError, notFound } from '@server/lib/app-error';
import { writeAudit } from '../audit';
import { findRetailProduct, insertRetailProduct, listRetailProducts, setStockCount, updateRetailProduct } from './retail-products.repository';

export async function retailProducts(db: Db, salonId: string): Promise<{ products: RetailProduct[] }> {
  return { products: await listRetailProducts(db, salonId) };
}

export async function addRetailProduct(db: Db, user: SessionUser, input: RetailProductInput): Promise<RetailProduct> {
  return db.transaction().execute(async (trx) => {
    const added = await insertRetailProduct(trx, user.salonId, input);
    await writeAudit(trx, { salonId: user.salonId, actorUserId: user.id, entity: 'retail_product', entityId: added.id, action: 'added', after: added });
    return added;
  });
}

/**
 * Changes a product's name, price and whether it is on sale; a new stock count only while the stock still stands
 * where the owner's form showed it (a sale at the desk meanwhile is a 409 naming `stock`, nothing changed).
 */
export async function changeRetailProduct(db: Db, user: SessionUser, id: string, change: RetailProductChange): Promise<RetailProduct> {
  return db.transaction().execute(async (trx) => {
    const before = await findRetailProduct(trx, user.salonId, id);
    if (!before) throw notFound('That product');
    await updateRetailProduct(trx, user.salonId, id, change);
    if (change.stock !== change.stockSeen && !(await setStockCount(trx, user.salonId, id, change.stockSeen, change.stock))) {
      const now = (await findRetailProduct(trx, user.salonId, id))?.stock;
      const message = `The stock is ${now} now, not ${change.stockSeen}: something was sold meanwhile. Count again and save.`;
      throw new AppError('CONFLICT', 409, message, { stock: message });
    }
    const after = await findRetailProduct(trx, user.salonId, id);
    if (!after) throw notFound('That product');
    const action = before.active === after.active ? 'changed' : after.active ? 'put back on sale' : 'retired';
    await writeAudit(trx, { salonId: user.salonId, actorUserId: user.id, entity: 'retail_product', entityId: id, action, before, after });
    return after;
  });
}
