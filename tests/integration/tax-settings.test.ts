import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser } from '../factories/user';
import { setupPaths } from '../setup/setup-paths';

let t: TestApp;
let salon: SalonFixture;
let owner$: Awaited<ReturnType<typeof signedInAgent>>;

beforeAll(async () => {
  t = await startTestApp();
  salon = await insertSalon(t.testDb.db);
  const owner = await insertUser(t.testDb.db, salon.salonId, 'owner');
  owner$ = await signedInAgent(t.app, owner.email, owner.password);
});
afterAll(() => t.close());

/** The settings as the form sends them back, with `change` on top. */
async function save(change: Record<string, unknown>) {
  const current = (await owner$.get(setupPaths.salon)).body;
  return owner$.write('put', setupPaths.salon, { ...current, ...change });
}

describe('salon tax settings', () => {
  it('start at no tax on prices without it', async () => {
    const res = await owner$.get(setupPaths.salon);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ taxRateMilliPercent: 0, taxInclusive: false });
  });

  it('store a rate with three decimals and prices that include it, and keep them when a save leaves them out', async () => {
    const saved = await save({ taxRateMilliPercent: 7125, taxInclusive: true }); // 7.125 %
    expect(saved.status).toBe(200);
    expect(saved.body).toMatchObject({ taxRateMilliPercent: 7125, taxInclusive: true });
    const row = await t.testDb.db
      .selectFrom('salons')
      .select(['tax_rate_milli_percent', 'tax_inclusive'])
      .where('id', '=', salon.salonId)
      .executeTakeFirstOrThrow();
    expect(row).toEqual({ tax_rate_milli_percent: 7125, tax_inclusive: true });

    const { taxRateMilliPercent: _rate, taxInclusive: _inclusive, ...older } = saved.body;
    expect((await owner$.write('put', setupPaths.salon, older)).body).toMatchObject({ taxRateMilliPercent: 7125, taxInclusive: true });
    const audit = await t.testDb.db.selectFrom('audit_log').select('after').where('entity', '=', 'salon').where('entity_id', '=', salon.salonId).execute();
    expect(audit.some((a) => (a.after as { taxRateMilliPercent?: number }).taxRateMilliPercent === 7125)).toBe(true);
  });

  it('allow 0 to 50 %', async () => {
    expect((await save({ taxRateMilliPercent: 50_000 })).body.taxRateMilliPercent).toBe(50_000);
    expect((await save({ taxRateMilliPercent: 0, taxInclusive: false })).body).toMatchObject({ taxRateMilliPercent: 0, taxInclusive: false });
  });

  it.each([
    ['above 50 %', 50_001, 'At most 50 %'],
    ['below zero', -1, 'At least 0 %'],
    ['more than three decimals', 8250.5, 'At most three decimals'],
    ['a percentage typed as text', '8.25', 'Enter a rate, e.g. 8.25'],
  ])('refuse a rate %s with a 400 naming it, changing nothing', async (_what, rate, message) => {
    const res = await save({ taxRateMilliPercent: rate, name: 'Renamed meanwhile' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.taxRateMilliPercent).toBe(message);
    expect((await owner$.get(setupPaths.salon)).body.name).not.toBe('Renamed meanwhile');
  });

  it('are held to 0–50 % by the database too', async () => {
    await expect(sql`update salons set tax_rate_milli_percent = 50001 where id = ${salon.salonId}`.execute(t.testDb.db)).rejects.toThrow(/check constraint/);
  });
});
