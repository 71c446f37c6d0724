import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { takeFromStock } from '@server/features/retail-products';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser } from '../factories/user';
import { setupPaths } from '../setup/setup-paths';

type Agent = Awaited<ReturnType<typeof signedInAgent>>;
let t: TestApp;
let salon: SalonFixture;
let owner$: Agent;
let desk$: Agent;
let stylist$: Agent;
let otherOwner$: Agent;
const deskList = '/api/retail-products';

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db);
  const other = await insertSalon(db);
  const [owner, desk, stylist, otherOwner] = await Promise.all([
    insertUser(db, salon.salonId, 'owner'),
    insertUser(db, salon.salonId, 'front_desk'),
    insertUser(db, salon.salonId, 'stylist'),
    insertUser(db, other.salonId, 'owner'),
  ]);
  owner$ = await signedInAgent(t.app, owner.email, owner.password);
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
  stylist$ = await signedInAgent(t.app, stylist.email, stylist.password);
  otherOwner$ = await signedInAgent(t.app, otherOwner.email, otherOwner.password);
});
afterAll(() => t.close());

async function add(name: string, priceCents = 2400, stock = 10) {
  const res = await owner$.write('post', setupPaths.retailProducts, { name, priceCents, stock });
  expect(res.status).toBe(201);
  return res.body as { id: string; name: string; priceCents: number; stock: number; active: boolean };
}

const change = (p: { name: string; priceCents: number; stock: number; active: boolean }, edit: Record<string, unknown> = {}) => ({
  name: p.name,
  priceCents: p.priceCents,
  stock: p.stock,
  stockSeen: p.stock,
  active: p.active,
  ...edit,
});

describe('retail products: the owner keeps them, the desk reads them', () => {
  it('adds products and lists them for the desk; a stylist may not read them and only the owner writes', async () => {
    const shampoo = await add('Bond shampoo', 2400, 12);
    expect(shampoo).toMatchObject({ name: 'Bond shampoo', priceCents: 2400, stock: 12, active: true });
    await add('Colour mask', 3150, 4);
    const list = await desk$.get(deskList);
    expect(list.status).toBe(200);
    expect(list.body.products.map((p: { name: string }) => p.name)).toEqual(['Bond shampoo', 'Colour mask']);
    expect((await stylist$.get(deskList)).status).toBe(403);
    expect((await desk$.write('post', setupPaths.retailProducts, { name: 'Oil', priceCents: 100, stock: 1 })).status).toBe(403);
    const audit = await t.testDb.db.selectFrom('audit_log').selectAll().where('entity_id', '=', shampoo.id).execute();
    expect(audit.map((a) => [a.entity, a.action])).toEqual([['retail_product', 'added']]);
  });

  it.each([
    ['a blank name', { name: '  ', priceCents: 100, stock: 1 }, 'name'],
    ['a negative price', { name: 'Oil', priceCents: -1, stock: 1 }, 'priceCents'],
    ['a fraction of a cent', { name: 'Oil', priceCents: 10.5, stock: 1 }, 'priceCents'],
    ['stock below zero', { name: 'Oil', priceCents: 100, stock: -1 }, 'stock'],
    ['part of an item', { name: 'Oil', priceCents: 100, stock: 1.5 }, 'stock'],
    ['no price', { name: 'Oil', stock: 1 }, 'priceCents'],
  ])('refuses %s with a 400 naming the field, storing nothing', async (_what, body, field) => {
    const res = await owner$.write('post', setupPaths.retailProducts, body);
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty(field);
    expect(await t.testDb.db.selectFrom('retail_products').select('id').where('name', '=', 'Oil').execute()).toEqual([]);
  });

  it('refuses a name another product has (409 naming it), and an unknown field', async () => {
    const taken = await owner$.write('post', setupPaths.retailProducts, { name: 'Bond shampoo', priceCents: 100, stock: 1 });
    expect(taken.status).toBe(409);
    expect(taken.body.error.fields).toHaveProperty('name');
    const unknown = await owner$.write('post', setupPaths.retailProducts, { name: 'Scalp serum', priceCents: 100, stock: 1, salonId: salon.salonId });
    expect(unknown.status).toBe(400);
  });

  it('changes the name, price and stock count, retires a product and puts it back on sale', async () => {
    const serum = await add('Scalp serum', 4200, 3);
    const changed = await owner$.write('put', setupPaths.retailProduct(serum.id), change(serum, { name: 'Scalp serum 50 ml', priceCents: 4400, stock: 9 }));
    expect(changed.status).toBe(200);
    expect(changed.body).toMatchObject({ name: 'Scalp serum 50 ml', priceCents: 4400, stock: 9, active: true });

    const retired = await owner$.write('put', setupPaths.retailProduct(serum.id), change(changed.body, { active: false }));
    expect(retired.body.active).toBe(false);
    const list = await desk$.get(deskList);
    // Products on sale come first; a retired one stays listed (sold lines refer to it), marked.
    expect(list.body.products.at(-1)).toMatchObject({ id: serum.id, active: false });
    const back = await owner$.write('put', setupPaths.retailProduct(serum.id), change(retired.body, { active: true }));
    expect(back.body.active).toBe(true);
    const actions = await t.testDb.db.selectFrom('audit_log').select('action').where('entity_id', '=', serum.id).orderBy('id').execute();
    expect(actions.map((a) => a.action)).toEqual(['added', 'changed', 'retired', 'put back on sale']);
  });

  it('refuses a stock count over a sale made since the form was opened, and changes nothing', async () => {
    const oil = await add('Hair oil', 2980, 5);
    // The desk sells one while the owner's form still shows 5.
    expect(await takeFromStock(t.testDb.db, salon.salonId, oil.id, 1)).toBe(4);
    const stale = await owner$.write('put', setupPaths.retailProduct(oil.id), change(oil, { name: 'Argan oil', stock: 8 }));
    expect(stale.status).toBe(409);
    expect(stale.body.error.fields.stock).toBe('The stock is 4 now, not 5: something was sold meanwhile. Count again and save.');
    const row = await t.testDb.db.selectFrom('retail_products').selectAll().where('id', '=', oil.id).executeTakeFirstOrThrow();
    expect([row.name, row.stock]).toEqual(['Hair oil', 4]);
    // Changing the price while leaving the count as the form showed it does not touch the stock.
    const price = await owner$.write('put', setupPaths.retailProduct(oil.id), change(oil, { priceCents: 3100 }));
    expect(price.body).toMatchObject({ priceCents: 3100, stock: 4 });
  });

  it("answers 404 for another salon's product, and 400 for a bad id", async () => {
    const mine = await add('Leave-in spray');
    expect((await otherOwner$.write('put', setupPaths.retailProduct(mine.id), change(mine, { priceCents: 1 }))).status).toBe(404);
    expect((await otherOwner$.get(deskList)).body.products).toEqual([]);
    expect((await owner$.write('put', setupPaths.retailProduct('not-a-uuid'), change(mine))).status).toBe(400);
  });
});

describe('stock never goes below zero', () => {
  it('the database refuses a negative stock whatever writes it', async () => {
    const product = await add('Clarifying shampoo', 1800, 2);
    await expect(sql`update retail_products set stock = -1 where id = ${product.id}`.execute(t.testDb.db)).rejects.toThrow(
      /retail_products_stock_not_below_zero/,
    );
  });

  it('10 concurrent sales of one item each from a stock of 7: seven are taken, three refused, none twice', async () => {
    const product = await add('Gloss refresher', 2200, 7);
    // Each sale runs in its own transaction and holds its row lock a moment, as a checkout's transaction would.
    const sale = () =>
      t.testDb.db.transaction().execute(async (trx) => {
        const left = await takeFromStock(trx, salon.salonId, product.id, 1);
        await sql`select pg_sleep(0.02)`.execute(trx);
        return left;
      });
    const started = performance.now();
    const results = await Promise.all(Array.from({ length: 10 }, sale));
    const ms = performance.now() - started;
    const taken = results.filter((r): r is number => r !== null);
    expect(taken.sort((a, b) => a - b)).toEqual([0, 1, 2, 3, 4, 5, 6]); // each sale saw its own stock left
    expect(results.filter((r) => r === null)).toHaveLength(3);
    const row = await t.testDb.db.selectFrom('retail_products').select('stock').where('id', '=', product.id).executeTakeFirstOrThrow();
    expect(row.stock).toBe(0);
    console.log(`10 concurrent sales from a stock of 7: ${Math.round(ms)} ms`);
  });

  it('10 concurrent sales of three each from a stock of 10: three are taken and 1 is left', async () => {
    const product = await add('Bond mask', 4125, 10);
    const results = await Promise.all(Array.from({ length: 10 }, () => takeFromStock(t.testDb.db, salon.salonId, product.id, 3)));
    expect(results.filter((r) => r !== null).sort()).toEqual([1, 4, 7]);
    const row = await t.testDb.db.selectFrom('retail_products').select('stock').where('id', '=', product.id).executeTakeFirstOrThrow();
    expect(row.stock).toBe(1);
    // Another salon cannot take from it.
    const other = await insertSalon(t.testDb.db);
    expect(await takeFromStock(t.testDb.db, other.salonId, product.id, 1)).toBeNull();
  });
});
