import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertPlannedService, tonerPlan } from '../factories/service';
import { futureWeekday, localIso } from '../setup/dates';

let t: TestApp;
let salon: SalonFixture;
let ana: UserFixture;
let client: UserFixture;
let serviceId: string;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;
const thursday = futureWeekday(4, 2);

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db, { chairs: 3, basins: 1 });
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  ana = await insertUser(db, salon.salonId, 'stylist', { maxClientsAtOnce: 1 });
  client = await insertUser(db, salon.salonId, 'client');
  serviceId = await insertPlannedService(db, salon.salonId, { plan: tonerPlan });
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
});
afterAll(() => t.close());

const book = (start: string, key: string) =>
  desk$.write('post', '/api/bookings', { clientId: client.clientId, serviceId, stepPlan: tonerPlan, stylistId: ana.staffId, start, idempotencyKey: key });

/** Pairs of live steps that overlap on one resource: must always be none. */
async function overlaps() {
  const { rows } = await sql<{ n: number }>`
    select count(*)::int as n from booking_steps a join booking_steps b on a.id < b.id and a.during && b.during and a.live and b.live
    where (a.stylist_id = b.stylist_id and a.kind <> 'developing' and b.kind <> 'developing') or a.basin_id = b.basin_id`.execute(t.testDb.db);
  const chairs = await sql<{ n: number }>`
    select count(*)::int as n from sittings a join sittings b on a.id < b.id and a.chair_id = b.chair_id and a.during && b.during and a.live and b.live`.execute(
    t.testDb.db,
  );
  return rows[0]!.n + chairs.rows[0]!.n;
}

describe('racing bookings', () => {
  it('50 concurrent requests for the same option: exactly one succeeds, the rest get 409', async () => {
    const start = localIso(thursday, '10:00');
    const results = await Promise.all(Array.from({ length: 50 }, (_, i) => book(start, `race-same-${i}-000`)));
    const statuses = results.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(49);
    expect(await overlaps()).toBe(0);
  });

  it('50 concurrent requests for overlapping options of one stylist (one client at a time): exactly one succeeds', async () => {
    // Starts 5 minutes apart inside 25 minutes; each toner visit takes at least 30, so any two overlap.
    const starts = ['13:00', '13:05', '13:10', '13:15', '13:20', '13:25'];
    const results = await Promise.all(Array.from({ length: 50 }, (_, i) => book(localIso(thursday, starts[i % starts.length]!), `race-overlap-${i}-000`)));
    expect(results.filter((r) => r.status === 201)).toHaveLength(1);
    expect(results.filter((r) => r.status === 409)).toHaveLength(49);
    expect(await overlaps()).toBe(0);
  });

  it('50 concurrent retries of one request with the same key: one booking, every answer names it', async () => {
    const start = localIso(thursday, '15:00');
    const results = await Promise.all(Array.from({ length: 50 }, () => book(start, 'race-retry-key-0001')));
    expect(results.every((r) => r.status === 201)).toBe(true);
    expect(new Set(results.map((r) => r.body.id)).size).toBe(1);
  });

  it('one key sent with two different requests at once: one is booked, the other is refused 422 naming the key', async () => {
    const [a, b] = await Promise.all([book(localIso(thursday, '11:00'), 'race-two-bodies-01'), book(localIso(thursday, '12:00'), 'race-two-bodies-01')]);
    expect([a.status, b.status].sort()).toEqual([201, 422]);
    const refused = a.status === 422 ? a : b;
    expect(refused.body.error.code).toBe('IDEMPOTENCY_KEY_REUSED');
    expect(refused.body.error.fields.idempotencyKey).toMatch(/different request/);
  });

  it('a key reused later with another request is refused 422 naming the key, and books nothing more', async () => {
    const first = await book(localIso(thursday, '16:00'), 'reused-later-0001');
    expect(first.status).toBe(201);
    const count = async () => (await t.testDb.db.selectFrom('bookings').select('id').where('salon_id', '=', salon.salonId).execute()).length;
    const before = await count();
    const again = await book(localIso(thursday, '16:30'), 'reused-later-0001');
    expect(again.status).toBe(422);
    expect(again.body.error.fields.idempotencyKey).toBeTruthy();
    expect(await count()).toBe(before);
    // The same request with the same key still answers the first booking.
    expect((await book(localIso(thursday, '16:00'), 'reused-later-0001')).body.id).toBe(first.body.id);
  });
});
