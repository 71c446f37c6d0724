import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertPlannedService, tonerPlan } from '../factories/service';
import { futureWeekday, localIso } from '../setup/dates';
import { setupPaths } from '../setup/setup-paths';

let t: TestApp;
let salon: SalonFixture;
let owner$: Awaited<ReturnType<typeof signedInAgent>>;
let stylist: UserFixture;
let client: UserFixture;
let serviceId: string;

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db, { chairs: 1, basins: 1 });
  const owner = await insertUser(db, salon.salonId, 'owner');
  stylist = await insertUser(db, salon.salonId, 'stylist');
  client = await insertUser(db, salon.salonId, 'client');
  serviceId = await insertPlannedService(db, salon.salonId, { plan: tonerPlan, depositCents: 0 });
  owner$ = await signedInAgent(t.app, owner.email, owner.password);
});
afterAll(() => t.close());

describe('chairs and basins', () => {
  it('adds and renames, refusing a blank or taken name', async () => {
    const added = await owner$.write('post', setupPaths.unitsOf('chairs'), { name: 'Window chair' });
    expect(added.status).toBe(201);
    const chair = added.body.chairs.find((c: { name: string }) => c.name === 'Window chair');
    expect(chair).toBeDefined();
    const renamed = await owner$.write('put', setupPaths.unit('chairs', chair.id), { name: 'Garden chair' });
    expect(renamed.body.chairs.map((c: { name: string }) => c.name)).toContain('Garden chair');
    const blank = await owner$.write('post', setupPaths.unitsOf('basins'), { name: ' ' });
    expect(blank.status).toBe(400);
    expect(blank.body.error.fields).toHaveProperty('name');
    expect((await owner$.write('put', setupPaths.unit('chairs', chair.id), { name: 'Chair 1' })).status).toBe(409);
    expect((await owner$.write('post', '/api/owner/setup/units/sofas', { name: 'Sofa' })).status).toBe(400);
  });

  it('lists the future bookings a closure touches, and planning treats the closed basin as taken', async () => {
    const date = futureWeekday(4, 3);
    const next = futureWeekday(5, 3);
    const booked = await owner$.write('post', '/api/bookings', {
      clientId: client.clientId,
      serviceId,
      stepPlan: tonerPlan,
      stylistId: stylist.staffId,
      start: localIso(date, '10:00'),
      idempotencyKey: 'setup-units-0001',
    });
    expect(booked.status).toBe(201);
    const basin = salon.basins[0]!;
    const preview = await owner$.get(setupPaths.unitAffected('basins', basin, date, next));
    expect(preview.status).toBe(200);
    expect(preview.body.bookings.map((b: { id: string }) => b.id)).toEqual([booked.body.id]);
    const none = await owner$.get(setupPaths.unitAffected('basins', basin, futureWeekday(2, 5), futureWeekday(2, 5)));
    expect(none.body.bookings).toEqual([]);

    const closed = await owner$.write('post', setupPaths.unitOutOfService('basins', basin), { from: next, to: next, reason: 'Plumber' });
    expect(closed.status).toBe(201);
    expect(closed.body.bookings).toEqual([]);
    const units = await owner$.get(setupPaths.units);
    expect(units.body.basins[0].outOfService).toHaveLength(1);
    // The only basin is out on that day, and the toner needs a rinse: no option that day.
    const options = await owner$.write('post', '/api/booking-options', {
      clientId: client.clientId,
      serviceId,
      stepPlan: tonerPlan,
      stylistId: stylist.staffId,
      earliestDate: next,
      limit: 3,
    });
    expect(options.status).toBe(200);
    expect(options.body.options.length).toBeGreaterThan(0);
    for (const o of options.body.options) expect(o.sittings[0].start.slice(0, 10)).not.toBe(next);

    const entry = units.body.basins[0].outOfService[0].id;
    expect((await owner$.write('delete', `${setupPaths.unitOutOfService('basins', basin)}/${entry}`)).status).toBe(204);
    const again = await owner$.write('post', '/api/booking-options', {
      clientId: client.clientId,
      serviceId,
      stepPlan: tonerPlan,
      stylistId: stylist.staffId,
      earliestDate: next,
      limit: 3,
    });
    expect(again.body.options[0].sittings[0].start.slice(0, 10)).toBe(next);
  });

  it('refuses a period that ends before it starts, and is for the owner only', async () => {
    const bad = await owner$.write('post', setupPaths.unitOutOfService('chairs', salon.chairs[0]!), { from: '2027-03-10', to: '2027-03-09', reason: '' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('to');
    expect(await t.testDb.db.selectFrom('out_of_service').select('id').where('chair_id', '=', salon.chairs[0]!).execute()).toHaveLength(0);
    const stylist$ = await signedInAgent(t.app, stylist.email, stylist.password);
    expect((await stylist$.get(setupPaths.units)).status).toBe(403);
    expect((await stylist$.write('post', setupPaths.unitsOf('chairs'), { name: 'Mine' })).status).toBe(403);
  });
});
