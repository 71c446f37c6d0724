import { Kysely, PostgresDialect } from 'kysely';
import { DateTime } from 'luxon';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertPlannedService } from '../factories/service';
import { futureWeekday } from '../setup/dates';
import type { Database } from '@server/db/schema';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import type { BookingOption } from '@shared/schemas/booking.schemas';
import { findSalon } from '@server/features/salon/salon.repository';
import { findBookingOptions } from '@server/features/bookings/booking-options.service';

// The desk's options come from one planning port: the salon's calendars are read once per request, labels travel
// through the engine, and what a client's skin test allows is a limit the engine searches within, so the desk
// gets as many options as it asked for whenever the book has them.

let t: TestApp;
let salon: SalonFixture;
let ana: UserFixture;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;
let rootColour: string;
const ZONE = 'America/Denver';
const HOUR = 3_600_000;
const DAY = 24 * HOUR;
const LEAD_HOURS = 720;
const VALIDITY_DAYS = 182;

const oxidative: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'hands_on', label: 'Apply colour to regrowth', product: 'oxidative_colour', minutes: 10 },
        { kind: 'developing', label: 'Colour develops', product: 'oxidative_colour', minMinutes: 30, maxMinutes: 35 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 15 },
      ],
    },
  ],
};

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db, { chairs: 2, basins: 1 });
  // A long lead time (the salon may set up to 720 hours) puts a new test's first colour day weeks away.
  await db.updateTable('salons').set({ skin_test_lead_hours: LEAD_HOURS, skin_test_validity_days: VALIDITY_DAYS }).where('id', '=', salon.salonId).execute();
  ana = await insertUser(db, salon.salonId, 'stylist', {
    skills: ['colour'],
    hours: { rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '09:00', end: '21:00' },
  });
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  rootColour = await insertPlannedService(db, salon.salonId, { name: 'Root colour', plan: oxidative, needsSkinTest: false, depositCents: 0 });
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
});
afterAll(() => t.close());

/**
 * A client whose last negative test stops being valid in two days, with a newer test applied yesterday and not
 * read: colour is allowed until day 2 on the old test, then only from day N = the new test plus the lead time.
 */
async function clientBetweenTests() {
  const client = await insertUser(t.testDb.db, salon.salonId, 'client');
  const now = Date.now();
  const oldApplied = new Date(now - (VALIDITY_DAYS - 2) * DAY);
  const newApplied = new Date(now - DAY);
  await t.testDb.db
    .insertInto('skin_tests')
    .values([
      {
        salon_id: salon.salonId,
        client_id: client.clientId!,
        applied_at: oldApplied,
        read_at: new Date(oldApplied.getTime() + 48 * HOUR),
        result: 'negative',
        recorded_by: null,
        created_at: oldApplied,
      },
      {
        salon_id: salon.salonId,
        client_id: client.clientId!,
        applied_at: newApplied,
        read_at: null,
        result: 'pending',
        recorded_by: null,
        created_at: newApplied,
      },
    ])
    .execute();
  return { client, dayN: new Date(newApplied.getTime() + LEAD_HOURS * HOUR) };
}

describe('what the skin test allows is a limit the engine searches within', () => {
  it('asks for K options from a date inside the gap between two tests and gets K, all on or after day N', async () => {
    const { client, dayN } = await clientBetweenTests();
    // From four days on the old test has lapsed and the new one cannot be relied on yet: weeks of open days in
    // between, far more than the options asked for (one stylist: one option per open day).
    const earliestDate = DateTime.now().setZone(ZONE).plus({ days: 4 }).toISODate()!;
    const K = 4;
    const res = await desk$.write('post', '/api/booking-options', {
      clientId: client.clientId,
      serviceId: rootColour,
      stepPlan: oxidative,
      stylistId: null,
      earliestDate,
      limit: K,
    });
    expect(res.status).toBe(200);
    expect(res.body.skinTest).toMatchObject({ required: true, ok: true });
    const options = res.body.options as BookingOption[];
    expect(options).toHaveLength(K);
    for (const o of options) {
      expect(Date.parse(o.sittings[0]!.start)).toBeGreaterThanOrEqual(dayN.getTime());
      expect(o.skinTest).toBe('waiting');
    }
    // One per open day (spread by day), so they are the first K open days from day N.
    expect(new Set(options.map((o) => o.sittings[0]!.start.slice(0, 10))).size).toBe(K);
  });

  it('carries each step’s label through the engine into the option', async () => {
    const { client } = await clientBetweenTests();
    const res = await desk$.write('post', '/api/booking-options', {
      clientId: client.clientId,
      serviceId: rootColour,
      stepPlan: oxidative,
      stylistId: ana.staffId,
      earliestDate: futureWeekday(2, 6),
      limit: 2,
    });
    expect(res.status).toBe(200);
    for (const o of res.body.options as BookingOption[]) {
      expect(o.sittings[0]!.steps.map((s) => [s.kind, s.label])).toEqual(oxidative.sittings[0]!.steps.map((s) => [s.kind, s.label]));
    }
  });
});

describe('one booking-options request', () => {
  it('reads the salon, its staff, chairs and basins once each (it read them 2, 4, 2 and 2 times before the port)', async () => {
    const statements: string[] = [];
    const logged = new Kysely<Database>({
      dialect: new PostgresDialect({ pool: t.testDb.pool }),
      log: (event) => {
        if (event.level === 'query') statements.push(event.query.sql);
      },
    });
    const client = await insertUser(t.testDb.db, salon.salonId, 'client');
    const body = {
      clientId: client.clientId!,
      serviceId: rootColour,
      stepPlan: { sittings: [{ steps: [{ kind: 'hands_on' as const, label: 'Blow-dry', product: 'none' as const, minutes: 30 }] }] },
      stylistId: null,
      earliestDate: futureWeekday(2, 2),
      limit: 6,
    };
    // As the route does it: the salon once, then the options.
    const answer = await findBookingOptions(logged, await findSalon(logged, salon.salonId), body, new Date());
    expect(answer.options.length).toBeGreaterThan(0);
    const reads = (table: string) => statements.filter((sql) => sql.includes(`"${table}"`)).length;
    const counts = { salons: reads('salons'), staff: reads('staff'), chairs: reads('chairs'), basins: reads('basins') };
    expect(counts).toEqual({ salons: 1, staff: 1, chairs: 1, basins: 1 });
  });
});
