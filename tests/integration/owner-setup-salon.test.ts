import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertPlannedService, tonerPlan } from '../factories/service';
import { futureWeekday } from '../setup/dates';
import { setupPaths } from '../setup/setup-paths';

let t: TestApp;
let salon: SalonFixture;
let owner$: Awaited<ReturnType<typeof signedInAgent>>;
let ownerUser: UserFixture;
let stylist: UserFixture;

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db);
  ownerUser = await insertUser(db, salon.salonId, 'owner');
  stylist = await insertUser(db, salon.salonId, 'stylist', { hours: { rrule: 'FREQ=DAILY', start: '08:00', end: '20:00' } });
  owner$ = await signedInAgent(t.app, ownerUser.email, ownerUser.password);
});
afterAll(() => t.close());

const valid = () => ({
  name: 'Kestrel Test Studio',
  address: '12 Pine Row',
  phone: '+1 303 555 0100',
  timeZone: 'America/Denver',
  currency: 'USD',
  hours: [{ rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '09:00', end: '19:00' }],
  skinTestLeadHours: 48,
  skinTestValidityDays: 182,
  holdMinutes: 10,
  cancellationWindowHours: 48,
  cancellationKeeps: 'deposit',
  quietFrom: '21:00',
  quietTo: '08:00',
  reminderOffsetsHours: [48, 24],
  maxDeveloperPercent: 12,
});

describe('salon settings', () => {
  it('reads the settings and opening hours, and stores a change with every field', async () => {
    const before = await owner$.get(setupPaths.salon);
    expect(before.status).toBe(200);
    expect(before.body.hours).toEqual([{ rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '09:00', end: '21:00' }]);
    // EU Regulation 1223/2009 Annex III (entry 12): at most 12 % hydrogen peroxide; the column's default.
    expect(before.body.maxDeveloperPercent).toBe(12);
    // A later client may be started up to 15 minutes late by default (common practice).
    expect(before.body.lateStartLimitMinutes).toBe(15);

    const body = {
      ...valid(),
      timeZone: 'Europe/Berlin',
      currency: 'EUR',
      cancellationKeeps: 'nothing',
      reminderOffsetsHours: [24, 72],
      maxDeveloperPercent: 9,
      lateStartLimitMinutes: 20,
      hours: [
        // Listed by start time, as they come back.
        { rrule: 'DTSTART;VALUE=DATE:20270102\nRRULE:FREQ=WEEKLY;INTERVAL=2;BYDAY=SA\nEXDATE;VALUE=DATE:20270116', start: '09:00', end: '14:00' },
        { rrule: 'FREQ=WEEKLY;BYDAY=MO,TU,WE', start: '10:00', end: '18:00' },
      ],
    };
    const res = await owner$.write('put', setupPaths.salon, body);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ ...body, reminderOffsetsHours: [72, 24] });
    const row = await t.testDb.db.selectFrom('salons').selectAll().where('id', '=', salon.salonId).executeTakeFirstOrThrow();
    expect(row).toMatchObject({
      time_zone: 'Europe/Berlin',
      currency: 'EUR',
      cancellation_keeps: 'nothing',
      quiet_from: '21:00:00',
      reminder_offsets_hours: [72, 24],
      late_start_limit_minutes: 20,
    });
    expect(await t.testDb.db.selectFrom('salon_hours').select('rrule').where('salon_id', '=', salon.salonId).execute()).toHaveLength(2);
    // Back to Denver for the other tests.
    expect((await owner$.write('put', setupPaths.salon, valid())).status).toBe(200);
  });

  it('refuses bad input naming each field, and stores nothing', async () => {
    const cases: [object, string][] = [
      [{ hours: [{ rrule: 'FREQ=SOMETIMES;BYDAY=MO', start: '09:00', end: '17:00' }] }, 'hours.0.rrule'],
      [{ hours: [{ rrule: 'BYDAY=MO', start: '09:00', end: '17:00' }] }, 'hours.0.rrule'],
      [{ hours: [{ rrule: 'FREQ=WEEKLY;BYDAY=MO', start: '17:00', end: '09:00' }] }, 'hours.0.end'],
      [{ hours: [] }, 'hours'],
      // Not a zone of the IANA time-zone database.
      [{ timeZone: 'Mars/Olympus_Mons' }, 'timeZone'],
      [{ currency: 'dollars' }, 'currency'],
      [{ maxDeveloperPercent: 15 }, 'maxDeveloperPercent'],
      [{ reminderOffsetsHours: [24, 24] }, 'reminderOffsetsHours'],
      [{ quietTo: '25:00' }, 'quietTo'],
      [{ holdMinutes: 0 }, 'holdMinutes'],
      [{ lateStartLimitMinutes: 241 }, 'lateStartLimitMinutes'],
    ];
    for (const [change, field] of cases) {
      const res = await owner$.write('put', setupPaths.salon, { ...valid(), name: 'Should not be stored', ...change });
      expect(res.status, JSON.stringify(change)).toBe(400);
      expect(Object.keys(res.body.error.fields), JSON.stringify(change)).toContain(field);
    }
    const row = await t.testDb.db.selectFrom('salons').select('name').where('id', '=', salon.salonId).executeTakeFirstOrThrow();
    expect(row.name).toBe('Kestrel Test Studio');
  });

  it('opening hours decide the desk’s booking options', async () => {
    const db = t.testDb.db;
    const client = await insertUser(db, salon.salonId, 'client');
    const serviceId = await insertPlannedService(db, salon.salonId, { plan: tonerPlan, depositCents: 0 });
    const monday = futureWeekday(1, 2);
    const ask = () =>
      owner$.write('post', '/api/booking-options', {
        clientId: client.clientId,
        serviceId,
        stepPlan: tonerPlan,
        stylistId: stylist.staffId,
        earliestDate: monday,
        limit: 3,
      });
    const closed = await ask();
    expect(closed.status).toBe(200);
    // Tue–Sat only: the first option is not on Monday.
    expect(closed.body.options[0].sittings[0].start.slice(0, 10)).not.toBe(monday);
    await owner$.write('put', setupPaths.salon, { ...valid(), hours: [{ rrule: 'FREQ=WEEKLY;BYDAY=MO', start: '11:00', end: '15:00' }] });
    const open = await ask();
    expect(open.body.options[0].sittings[0].start).toMatch(new RegExp(`^${monday}T11:00`));
    await owner$.write('put', setupPaths.salon, valid());
  });

  it('every set-up route is declared for the owner only', () => {
    const setup = t.app.apiRoutes.filter((r) => r.path.startsWith('/api/owner/setup'));
    expect(setup.length).toBeGreaterThanOrEqual(18);
    for (const r of setup) expect(r.access, `${r.method} ${r.path}`).toEqual(['owner']);
  });

  it('is for the owner only', async () => {
    const desk = await insertUser(t.testDb.db, salon.salonId, 'front_desk');
    const desk$ = await signedInAgent(t.app, desk.email, desk.password);
    expect((await desk$.get(setupPaths.salon)).status).toBe(403);
    expect((await desk$.write('put', setupPaths.salon, valid())).status).toBe(403);
    const stylist$ = await signedInAgent(t.app, stylist.email, stylist.password);
    expect((await stylist$.write('put', setupPaths.salon, valid())).status).toBe(403);
  });
});
