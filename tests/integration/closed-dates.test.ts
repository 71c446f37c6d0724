import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertPlannedService, tonerPlan } from '../factories/service';
import { futureWeekday, localIso } from '../setup/dates';
import { setupPaths } from '../setup/setup-paths';
import { composeWeeklyRule } from '@shared/engine/weekly-rule';
import { localDateOf } from '@shared/time/salon-time';

// A closed date written by the Set-up form (an EXDATE line, RFC 5545 §3.8.5.1) once answered 500 on the public
// page for every visitor. The same text must work for every reader: public page, free times, desk options, booking.
let t: TestApp;
let salon: SalonFixture;
let slug: string;
let owner$: Awaited<ReturnType<typeof signedInAgent>>;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;
let stylist: UserFixture;
let client: UserFixture;
let service: string;
const closed = futureWeekday(2, 2); // a Tuesday two weeks ahead
const nextDay = futureWeekday(3, 2);

const settings = (rrule: string) => ({
  name: 'Closed Date Studio',
  address: '1 Elm Row',
  phone: '+1 303 555 0100',
  timeZone: 'America/Denver',
  currency: 'USD',
  hours: [{ rrule, start: '09:00', end: '21:00' }],
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

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db);
  slug = (await db.selectFrom('salons').select('slug').where('id', '=', salon.salonId).executeTakeFirstOrThrow()).slug;
  const owner = await insertUser(db, salon.salonId, 'owner');
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  stylist = await insertUser(db, salon.salonId, 'stylist');
  client = await insertUser(db, salon.salonId, 'client');
  service = await insertPlannedService(db, salon.salonId, { name: 'Toner refresh', plan: tonerPlan, category: 'treatment' });
  await db.updateTable('services').set({ online_bookable: true }).where('id', '=', service).execute();
  owner$ = await signedInAgent(t.app, owner.email, owner.password);
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
  // Exactly the text the hours editor writes when "Add closed date" is pressed.
  const rule = composeWeeklyRule({ weekdays: ['TU', 'WE', 'TH', 'FR', 'SA'], everyOtherWeek: false, startsOn: null, closedDates: [closed] });
  expect(rule).toContain('EXDATE;VALUE=DATE:');
  const saved = await owner$.write('put', setupPaths.salon, settings(rule));
  expect(saved.status).toBe(200);
});
afterAll(() => t.close());

describe('a closed date saved in Set-up', () => {
  it('keeps the public page up and says the salon is closed that day', async () => {
    const page = await (await anonymousAgent(t.app)).get(`/api/public/salons/${slug}`);
    expect(page.status).toBe(200);
    expect(page.body.openingHours).toHaveLength(1);
    // The format policy (docs/architecture.md, Formats): times on the 12-hour clock of the salon's locale, phone
    // numbers as people write them in the salon's country (libphonenumber-js's national form for the US).
    expect(page.body.openingHours[0]).toMatch(/^Tuesday to Saturday; closed on .+, 9:00 AM – 9:00 PM$/);
    expect(page.body.phoneText).toBe('(303) 555-0100');
  });

  it('offers no free time online on that date, and times on the next open day', async () => {
    const times = await (await anonymousAgent(t.app)).get(`/api/public/salons/${slug}/availability?serviceId=${service}&from=${closed}`);
    expect(times.status).toBe(200);
    const dates = new Set(times.body.times.map((x: { start: string }) => localDateOf(x.start, 'America/Denver')));
    expect(dates.has(closed)).toBe(false);
    expect(dates.has(nextDay)).toBe(true);
  });

  it('gives the desk no option on that date, and refuses a booking there', async () => {
    const options = await desk$.write('post', '/api/booking-options', {
      clientId: client.clientId,
      serviceId: service,
      stepPlan: tonerPlan,
      stylistId: null,
      earliestDate: closed,
    });
    expect(options.status).toBe(200);
    expect(options.body.options.length).toBeGreaterThan(0);
    for (const o of options.body.options) expect(localDateOf(o.sittings[0].start, 'America/Denver')).not.toBe(closed);
    const booked = await desk$.write('post', '/api/bookings', {
      clientId: client.clientId,
      serviceId: service,
      stepPlan: tonerPlan,
      stylistId: stylist.staffId,
      start: localIso(closed, '10:00'),
      idempotencyKey: `closed-${Date.now()}`,
    });
    expect(booked.status).toBe(409);
  });

  it('reads back in the Set-up form as the weekday rule with its closed date', async () => {
    const back = await owner$.get(setupPaths.salon);
    expect(back.body.hours[0].rrule.split('\n')).toEqual(['RRULE:FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', `EXDATE;VALUE=DATE:${closed.replaceAll('-', '')}`]);
  });

  it('refuses a rule text that parses but cannot be read back, naming the field, and keeps the old hours', async () => {
    const bad = await owner$.write('put', setupPaths.salon, settings('RRULE:FREQ=WEEKLY;BYDAY=TU\nEXDATE;VALUE=DATE:2027013'));
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toContain('hours.0.rrule');
    const page = await (await anonymousAgent(t.app)).get(`/api/public/salons/${slug}`);
    expect(page.body.openingHours[0]).toMatch(/closed on/);
  });
});
