import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadBusySalon, type BusySalon } from '../bench/busy-salon-db';
import { createTestDb, type TestDb } from '../setup/test-db';
import { freeTimes } from '@server/features/online-booking/availability.service';
import { optionsFor } from '@server/features/planning/planning-port';
import { listServices } from '@server/features/services/services.repository';

let testDb: TestDb;
let busy: BusySalon;

beforeAll(async () => {
  testDb = await createTestDb();
  busy = await loadBusySalon(testDb.db, { from: '2027-03-01', months: 1, now: new Date('2027-03-15T12:00:00Z') });
}, 120_000);
afterAll(() => testDb.drop());

describe('busy salon loader', () => {
  it('writes the bench generator’s salon as rows that pass the database’s own no-double-booking constraints', async () => {
    expect(busy.to).toBe('2027-04-01');
    // 2,500 bookings in 42 days is the engine bench's density; March has 31 days → about 1,845 asked for.
    expect(busy.counts.bookings).toBeGreaterThan(1500);
    const count = async (table: 'staff' | 'chairs' | 'basins' | 'services' | 'clients' | 'bookings') =>
      (
        await testDb.db
          .selectFrom(table)
          .select(sql<number>`count(*)::int`.as('n'))
          .where('salon_id', '=', busy.salonId)
          .executeTakeFirstOrThrow()
      ).n;
    expect(await count('staff')).toBe(12);
    expect(await count('chairs')).toBe(14);
    expect(await count('basins')).toBe(4);
    expect(await count('services')).toBe(busy.counts.services);
    expect(await count('clients')).toBe(busy.counts.clients);
    expect(await count('bookings')).toBe(busy.counts.bookings);
    const statuses = await testDb.db
      .selectFrom('bookings')
      .select(['status', sql<number>`count(*)::int`.as('n')])
      .where('salon_id', '=', busy.salonId)
      .groupBy('status')
      .execute();
    const by = Object.fromEntries(statuses.map((s) => [s.status, s.n]));
    expect(by.cancelled).toBe(busy.counts.cancelled);
    expect(by.no_show).toBe(busy.counts.noShows);
    expect(by.finished).toBeGreaterThan(0);
    expect(by.booked).toBeGreaterThan(0);
    // Cancelled bookings hold nothing: none of their sittings is live.
    const liveCancelled = await testDb.db
      .selectFrom('sittings as s')
      .innerJoin('bookings as b', 'b.id', 's.booking_id')
      .select(sql<number>`count(*)::int`.as('n'))
      .where('b.salon_id', '=', busy.salonId)
      .where('b.status', '=', 'cancelled')
      .where('s.live', '=', true)
      .executeTakeFirstOrThrow();
    expect(liveCancelled.n).toBe(0);
  });

  it('gives the same book for the same seed', async () => {
    const again = await loadBusySalon(testDb.db, { from: '2027-03-01', months: 1, now: new Date('2027-03-15T12:00:00Z') });
    expect(again.counts).toEqual(busy.counts);
    expect(again.salonId).not.toBe(busy.salonId);
  }, 120_000);

  it.each([
    ['any stylist: the first week fills the list', false],
    ['one stylist: the first week does not, and only the two weeks after it are read next', true],
  ])('gives public free times from a first-week search equal to the engine over the whole three weeks (%s)', async (_name, oneStylist) => {
    const now = new Date('2027-03-02T15:00:00Z');
    const service = (await listServices(testDb.db, busy.salonId)).find((s) => s.stepPlan.sittings.length === 1 && !s.needsSkinTest)!;
    const stylist = oneStylist
      ? (
          await testDb.db
            .selectFrom('staff')
            .select('id')
            .where('salon_id', '=', busy.salonId)
            .where(sql<boolean>`${service.skill} = any(skills)`)
            .orderBy('id')
            .executeTakeFirstOrThrow()
        ).id
      : undefined;
    const salon = { id: busy.salonId, time_zone: busy.timeZone, granularity_minutes: 5 };
    const answer = await freeTimes(testDb.db, salon, service, stylist, '2027-03-02', now);
    // The whole three weeks read at once.
    const { options: full } = await optionsFor(
      testDb.db,
      { id: busy.salonId, timeZone: busy.timeZone, granularityMinutes: 5 },
      {
        skill: service.skill,
        stylistId: stylist ?? null,
        plan: service.stepPlan,
        earliest: now,
        horizons: [{ from: '2027-03-02', to: '2027-03-23' }],
        limit: 400,
        spread: 'none',
      },
    );
    if (oneStylist) {
      const firstWeekEnd = Date.parse('2027-03-09T07:00:00Z');
      expect(answer.times.some((t) => Date.parse(t.start) >= firstWeekEnd)).toBe(true);
    } else {
      expect(answer.times).toHaveLength(400);
    }
    expect(answer.times.map((t) => [t.stylistId, t.start, t.end])).toEqual(
      full.map((o) => [o.stylist, o.sittings[0]!.steps[0]!.start, o.sittings[0]!.steps[o.sittings[0]!.steps.length - 1]!.end]),
    );
  });
});
