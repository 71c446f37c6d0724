import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { tonerPlan } from '../factories/service';
import { futureWeekday, localIso } from '../setup/dates';
import { setupPaths } from '../setup/setup-paths';

let t: TestApp;
let salon: SalonFixture;
let owner$: Awaited<ReturnType<typeof signedInAgent>>;
let stylist: UserFixture;
let client: UserFixture;

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db);
  const owner = await insertUser(db, salon.salonId, 'owner');
  stylist = await insertUser(db, salon.salonId, 'stylist');
  client = await insertUser(db, salon.salonId, 'client');
  owner$ = await signedInAgent(t.app, owner.email, owner.password);
});
afterAll(() => t.close());

const service = (overrides: object = {}) => ({
  name: 'Gloss and tone',
  description: 'A toner between colour appointments.',
  category: 'colour',
  skill: 'colour',
  priceCents: 8000,
  priceIsFrom: false,
  onlineBookable: true,
  needsSkinTest: false,
  depositKind: 'percent',
  depositCents: 0,
  depositPercent: 25,
  stepPlan: tonerPlan,
  ...overrides,
});

describe('services and step plans', () => {
  it('adds a service; a percentage deposit is that share of the price', async () => {
    const res = await owner$.write('post', setupPaths.services, service());
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: 'Gloss and tone', depositPercent: 25, depositCents: 2000, active: true, futureBookings: 0, stepPlan: tonerPlan });
    const list = await owner$.get(setupPaths.services);
    expect(list.body.services.map((s: { name: string }) => s.name)).toContain('Gloss and tone');
    expect(list.body.skills).toContain('colour');
    // The desk's menu shows the same deposit.
    const menu = await owner$.get('/api/services');
    expect(menu.body.services.find((s: { id: string }) => s.id === res.body.id).depositCents).toBe(2000);
    expect((await owner$.write('post', setupPaths.services, service())).status).toBe(409);
  });

  it('changing a service never changes a booking already made: it keeps its own step plan, price and deposit', async () => {
    const created = await owner$.write(
      'post',
      setupPaths.services,
      service({ name: 'Snapshot check', depositKind: 'fixed', depositCents: 1500, depositPercent: null }),
    );
    const id = created.body.id;
    const date = futureWeekday(3, 3);
    const booked = await owner$.write('post', '/api/bookings', {
      clientId: client.clientId,
      serviceId: id,
      stepPlan: tonerPlan,
      stylistId: stylist.staffId,
      start: localIso(date, '10:00'),
      idempotencyKey: 'setup-snapshot-0001',
    });
    expect(booked.status).toBe(201);
    const longer = {
      sittings: [
        {
          steps: [
            { kind: 'hands_on', label: 'Apply toner', product: 'toner_direct', minutes: 30 },
            { kind: 'developing', label: 'Toner develops', product: 'toner_direct', minMinutes: 20, maxMinutes: 40 },
            { kind: 'basin', label: 'Rinse', product: 'none', minutes: 15 },
          ],
        },
      ],
    };
    const changed = await owner$.write(
      'put',
      setupPaths.service(id),
      service({ name: 'Snapshot check', priceCents: 12000, depositKind: 'fixed', depositCents: 4000, depositPercent: null, stepPlan: longer }),
    );
    expect(changed.status).toBe(200);
    expect(changed.body).toMatchObject({ priceCents: 12000, depositCents: 4000, stepPlan: longer, futureBookings: 1 });
    const row = await t.testDb.db
      .selectFrom('bookings')
      .select(['step_plan', 'price_cents', 'deposit_cents'])
      .where('id', '=', booked.body.id)
      .executeTakeFirstOrThrow();
    expect(row).toEqual({ step_plan: tonerPlan, price_cents: 8000, deposit_cents: 1500 });
    const view = await owner$.get(`/api/bookings/${booked.body.id}`);
    expect(view.body.sittings[0].steps.map((s: { label: string }) => s.label)).toEqual(['Apply toner', 'Toner develops', 'Rinse']);
    // The old plan takes 30–40 minutes of chair time; the new one would need at least 65.
    expect(new Date(view.body.sittings[0].end).getTime() - new Date(view.body.sittings[0].start).getTime()).toBeLessThanOrEqual(40 * 60_000);
  });

  it('refuses to take a service with future bookings off the menu, listing them; retires it once none are left', async () => {
    const created = await owner$.write('post', setupPaths.services, service({ name: 'Retire check' }));
    const id = created.body.id;
    const booked = await owner$.write('post', '/api/bookings', {
      clientId: client.clientId,
      serviceId: id,
      stepPlan: tonerPlan,
      stylistId: stylist.staffId,
      start: localIso(futureWeekday(4, 3), '10:00'),
      idempotencyKey: 'setup-retire-0001',
    });
    expect(booked.status).toBe(201);
    const refused = await owner$.write('delete', setupPaths.service(id));
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/Retire check still has 1 future booking: .*Client \d+ \(Retire check, Stylist \d+\)/);
    expect((await t.testDb.db.selectFrom('services').select('active').where('id', '=', id).executeTakeFirstOrThrow()).active).toBe(true);

    expect((await owner$.write('post', `/api/bookings/${booked.body.id}/cancel`, { reason: 'Test over' })).status).toBe(200);
    expect((await owner$.write('delete', setupPaths.service(id))).status).toBe(204);
    const menu = await owner$.get('/api/services');
    expect(menu.body.services.map((s: { id: string }) => s.id)).not.toContain(id);
  });

  it('refuses a bad step plan or deposit naming the field, and stores nothing', async () => {
    const cases: [object, string][] = [
      [{ stepPlan: { sittings: [{ steps: [] }] } }, 'stepPlan.sittings.0.steps'],
      [{ stepPlan: { sittings: [] } }, 'stepPlan.sittings'],
      [
        { stepPlan: { sittings: [{ steps: [{ kind: 'developing', label: 'Develops', product: 'none', minMinutes: 40, maxMinutes: 20 }] }] } },
        'stepPlan.sittings.0.steps.0.maxMinutes',
      ],
      [
        {
          stepPlan: {
            sittings: [
              { steps: [{ kind: 'hands_on', label: 'A', product: 'none', minutes: 30 }] },
              { steps: [{ kind: 'hands_on', label: 'B', product: 'none', minutes: 30 }] },
            ],
          },
        },
        'stepPlan.sittings.1.daysAfterPrevious',
      ],
      [{ depositKind: 'percent', depositPercent: null }, 'depositPercent'],
      [{ depositKind: 'fixed', depositCents: 9000, depositPercent: null }, 'depositCents'],
      [{ name: '' }, 'name'],
      [{ priceCents: -1 }, 'priceCents'],
    ];
    for (const [change, field] of cases) {
      const res = await owner$.write('post', setupPaths.services, service({ name: 'Never stored', ...change }));
      expect(res.status, JSON.stringify(change)).toBe(400);
      expect(Object.keys(res.body.error.fields), JSON.stringify(change)).toContain(field);
    }
    expect(await t.testDb.db.selectFrom('services').select('id').where('name', '=', 'Never stored').execute()).toHaveLength(0);
  });

  it('is for the owner only', async () => {
    const desk = await insertUser(t.testDb.db, salon.salonId, 'front_desk');
    const desk$ = await signedInAgent(t.app, desk.email, desk.password);
    expect((await desk$.get(setupPaths.services)).status).toBe(403);
    expect((await desk$.write('post', setupPaths.services, service({ name: 'Desk try' }))).status).toBe(403);
    // Another salon's owner cannot reach this salon's services.
    const mine = (await owner$.get(setupPaths.services)).body.services[0];
    const elsewhere = await insertSalon(t.testDb.db);
    const stranger = await insertUser(t.testDb.db, elsewhere.salonId, 'owner');
    const stranger$ = await signedInAgent(t.app, stranger.email, stranger.password);
    expect((await stranger$.write('put', setupPaths.service(mine.id), service({ name: 'Taken over' }))).status).toBe(404);
    expect((await stranger$.write('delete', setupPaths.service(mine.id))).status).toBe(404);
    expect((await stranger$.get(setupPaths.services)).body.services).toEqual([]);
  });
});
