import { sql } from 'kysely';
import { DateTime } from 'luxon';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestDb, type TestDb } from '../setup/test-db';
import { loadDemoSalon } from '@server/demo/load-demo-salon';

// The demo book as `npm start` loads it: past days as they went, today still to run.
let testDb: TestDb;
let zone: string;
beforeAll(async () => {
  testDb = await createTestDb();
  await loadDemoSalon(testDb.db, new Date());
  zone = (await testDb.db.selectFrom('salons').select('time_zone').executeTakeFirstOrThrow()).time_zone;
});
afterAll(() => testDb.drop());

describe('the demo book on the day', () => {
  it('past days carry actual step times, with overruns and early finishes; every finished sitting has its arrival', async () => {
    const todayStart = DateTime.now().setZone(zone).startOf('day').toJSDate();
    const steps = await testDb.db
      .selectFrom('booking_steps as st')
      .innerJoin('sittings as s', 's.id', 'st.sitting_id')
      .select([
        's.status',
        sql<number>`extract(epoch from (st.actual_end - st.actual_start)) / 60`.as('actual'),
        sql<number>`extract(epoch from (upper(st.during) - lower(st.during))) / 60`.as('planned'),
      ])
      .where(sql<boolean>`upper(s.during) <= ${todayStart}`)
      .where('s.status', '=', 'finished')
      .execute();
    expect(steps.length).toBeGreaterThan(20);
    expect(steps.every((s) => s.actual !== null)).toBe(true);
    expect(steps.some((s) => s.actual > s.planned)).toBe(true);
    expect(steps.some((s) => s.actual < s.planned)).toBe(true);
    const unarrived = await testDb.db.selectFrom('sittings').select('id').where('status', '=', 'finished').where('arrived_at', 'is', null).execute();
    expect(unarrived).toEqual([]);
  });

  it("today's bookings start as booked, with no taps yet", async () => {
    const day = DateTime.now().setZone(zone);
    const rows = await testDb.db
      .selectFrom('sittings as s')
      .innerJoin('bookings as b', 'b.id', 's.booking_id')
      .select(['b.status', 's.status as sittingStatus', 's.arrived_at'])
      .where(sql<boolean>`lower(s.during) >= ${day.startOf('day').toJSDate()} and lower(s.during) < ${day.endOf('day').toJSDate()}`)
      .where('b.status', '!=', 'cancelled')
      .execute();
    for (const r of rows) expect(r).toEqual({ status: 'booked', sittingStatus: 'booked', arrived_at: null });
  });
});
