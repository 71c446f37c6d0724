import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { waitForMail } from '../setup/mail';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertPlannedService, tonerPlan } from '../factories/service';
import { futureWeekday, localIso } from '../setup/dates';
import { setupPaths } from '../setup/setup-paths';

let t: TestApp;
let salon: SalonFixture;
let owner: UserFixture;
let owner$: Awaited<ReturnType<typeof signedInAgent>>;
let client: UserFixture;
let serviceId: string;

const weekdays = { rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '09:00', end: '18:00' };

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db, { chairs: 3 });
  owner = await insertUser(db, salon.salonId, 'owner');
  client = await insertUser(db, salon.salonId, 'client');
  serviceId = await insertPlannedService(db, salon.salonId, { plan: tonerPlan, depositCents: 0 });
  owner$ = await signedInAgent(t.app, owner.email, owner.password);
});
afterAll(() => t.close());

const details = (overrides: object = {}) => ({ name: 'Rowan Vale', role: 'stylist', skills: ['colour'], maxClientsAtOnce: 2, hours: [weekdays], ...overrides });

describe('staff', () => {
  it('invites by e-mail; the link sets a password and the new stylist can sign in and be booked', async () => {
    const email = 'rowan.vale@example.test';
    const res = await owner$.write('post', setupPaths.staff, { email, details: details() });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      email,
      invited: true,
      active: true,
      details: { name: 'Rowan Vale', role: 'stylist', skills: ['colour'], maxClientsAtOnce: 2, hours: [weekdays] },
    });
    expect(res.body.staffId).toBeTruthy();
    const mail = await waitForMail(t.smtp, email);
    const token = /reset-password\?token=([A-Za-z0-9_-]+)/.exec(mail.text)?.[1];
    expect(token).toBeDefined();
    const anon = await anonymousAgent(t.app);
    expect((await anon.write('post', '/api/session', { email, password: 'anything-at-all-123' })).status).toBe(401);
    expect((await anon.write('post', '/api/password-reset/confirm', { token, password: 'heather-lantern-copper-71' })).status).toBe(204);
    await signedInAgent(t.app, email, 'heather-lantern-copper-71');
    const list = await owner$.get(setupPaths.staff);
    expect(list.body.staff.find((m: { email: string }) => m.email === email).invited).toBe(false);
    expect((await owner$.write('post', setupPaths.staff, { email: 'ROWAN.VALE@example.test', details: details() })).status).toBe(409);
  });

  it('changes role, skills, cap and working hours; adds and removes time off', async () => {
    const stylist = await insertUser(t.testDb.db, salon.salonId, 'stylist');
    const hours = [{ rrule: 'DTSTART;VALUE=DATE:20270105\nRRULE:FREQ=WEEKLY;INTERVAL=2;BYDAY=TU,WE', start: '10:00', end: '16:00' }];
    const res = await owner$.write(
      'put',
      setupPaths.staffMember(stylist.id),
      details({ name: 'Sage Holloway', skills: ['colour', 'cut'], maxClientsAtOnce: 3, hours }),
    );
    expect(res.status).toBe(200);
    expect(res.body.details).toEqual({ name: 'Sage Holloway', role: 'stylist', skills: ['colour', 'cut'], maxClientsAtOnce: 3, hours });
    const off = await owner$.write('post', setupPaths.staffTimeOff(stylist.id), { from: '2027-02-02', to: '2027-02-03', reason: 'Course' });
    expect(off.status).toBe(201);
    // Whole days in the salon's zone (America/Denver is UTC−7 in February, IANA tz database).
    expect(off.body.timeOff).toEqual([{ id: expect.any(String), start: '2027-02-02T07:00:00.000Z', end: '2027-02-04T07:00:00.000Z', reason: 'Course' }]);
    expect((await owner$.write('delete', setupPaths.staffTimeOffEntry(stylist.id, off.body.timeOff[0].id))).status).toBe(204);
    const bad = await owner$.write('post', setupPaths.staffTimeOff(stylist.id), { from: '2027-02-05', to: '2027-02-03', reason: '' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('to');
  });

  it('refuses bad staff details naming the field, and stores nothing', async () => {
    const stylist = await insertUser(t.testDb.db, salon.salonId, 'stylist');
    const cases: [object, string][] = [
      [{ hours: [{ rrule: 'FREQ=WEEKLY;BYDAY=NOPE', start: '09:00', end: '17:00' }] }, 'hours.0.rrule'],
      [{ hours: [{ rrule: 'FREQ=WEEKLY;BYDAY=MO', start: '18:00', end: '09:00' }] }, 'hours.0.end'],
      [{ hours: [] }, 'hours'],
      [{ skills: [] }, 'skills'],
      [{ maxClientsAtOnce: 9 }, 'maxClientsAtOnce'],
    ];
    for (const [change, field] of cases) {
      const res = await owner$.write('put', setupPaths.staffMember(stylist.id), details({ name: 'Never stored', ...change }));
      expect(res.status, JSON.stringify(change)).toBe(400);
      expect(Object.keys(res.body.error.fields), JSON.stringify(change)).toContain(field);
    }
    const row = await t.testDb.db.selectFrom('users').select('name').where('id', '=', stylist.id).executeTakeFirstOrThrow();
    expect(row.name).not.toBe('Never stored');
  });

  it('lists future bookings with who is free, re-assigns them, and only then deactivates', async () => {
    const db = t.testDb.db;
    const leaving = await insertUser(db, salon.salonId, 'stylist');
    const free = await insertUser(db, salon.salonId, 'stylist');
    const offThatDay = await insertUser(db, salon.salonId, 'stylist', { hours: { rrule: 'FREQ=WEEKLY;BYDAY=MO', start: '09:00', end: '18:00' } });
    const cutOnly = await insertUser(db, salon.salonId, 'stylist', { skills: ['cut'] });
    const date = futureWeekday(3, 2);
    const booked = await owner$.write('post', '/api/bookings', {
      clientId: client.clientId,
      serviceId,
      stepPlan: tonerPlan,
      stylistId: leaving.staffId,
      start: localIso(date, '10:00'),
      idempotencyKey: 'setup-staff-0001',
    });
    expect(booked.status).toBe(201);
    // The free stylist is busy at the same time with another client's hands-on step: not free.
    const busy = await insertUser(db, salon.salonId, 'stylist');
    const other = await insertUser(db, salon.salonId, 'client');
    expect(
      (
        await owner$.write('post', '/api/bookings', {
          clientId: other.clientId,
          serviceId,
          stepPlan: tonerPlan,
          stylistId: busy.staffId,
          start: localIso(date, '10:00'),
          idempotencyKey: 'setup-staff-0002',
        })
      ).status,
    ).toBe(201);

    const refused = await owner$.write('post', setupPaths.staffDeactivate(leaving.id));
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/still has 1 future booking/);

    const listed = await owner$.get(setupPaths.staffBookings(leaving.id));
    expect(listed.status).toBe(200);
    expect(listed.body.bookings).toHaveLength(1);
    const freeIds = listed.body.bookings[0].freeStylists.map((s: { id: string }) => s.id);
    expect(freeIds).toContain(free.staffId);
    expect(freeIds).not.toContain(offThatDay.staffId);
    expect(freeIds).not.toContain(cutOnly.staffId);
    expect(freeIds).not.toContain(busy.staffId);
    expect(freeIds).not.toContain(leaving.staffId);

    const wrong = await owner$.write('post', setupPaths.staffReassign(leaving.id), { bookingId: booked.body.id, toStaffId: busy.staffId });
    expect(wrong.status).toBe(409);
    const moved = await owner$.write('post', setupPaths.staffReassign(leaving.id), { bookingId: booked.body.id, toStaffId: free.staffId });
    expect(moved.status).toBe(200);
    expect(moved.body.bookings).toEqual([]);
    const steps = await db
      .selectFrom('booking_steps as s')
      .innerJoin('sittings as si', 'si.id', 's.sitting_id')
      .select('s.stylist_id')
      .where('si.booking_id', '=', booked.body.id)
      .execute();
    expect(new Set(steps.map((s) => s.stylist_id))).toEqual(new Set([free.staffId]));

    const done = await owner$.write('post', setupPaths.staffDeactivate(leaving.id));
    expect(done.status).toBe(200);
    expect(done.body.active).toBe(false);
    const anon = await anonymousAgent(t.app);
    expect((await anon.write('post', '/api/session', { email: leaving.email, password: leaving.password })).status).toBe(401);
    const stylists = await owner$.get('/api/stylists');
    expect(stylists.body.stylists.map((s: { id: string }) => s.id)).not.toContain(leaving.staffId);
  });

  it('is for the owner only', async () => {
    const desk = await insertUser(t.testDb.db, salon.salonId, 'front_desk');
    const desk$ = await signedInAgent(t.app, desk.email, desk.password);
    expect((await desk$.get(setupPaths.staff)).status).toBe(403);
    expect((await desk$.write('post', setupPaths.staff, { email: 'x@example.test', details: details() })).status).toBe(403);
    expect((await desk$.write('post', setupPaths.staffDeactivate(owner.id))).status).toBe(403);
  });
});
