import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { correctionPlan, insertNegativeSkinTest, insertPlannedService } from '../factories/service';
import { futureWeekday, localIso } from '../setup/dates';
import { depositOutcome } from '@server/features/bookings/cancel-booking.service';

let t: TestApp;
let salon: SalonFixture;
let ana: UserFixture;
let client: UserFixture;
let serviceId: string;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;
const wednesday = futureWeekday(3, 4);

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db, { chairs: 2, basins: 1 });
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  ana = await insertUser(db, salon.salonId, 'stylist');
  client = await insertUser(db, salon.salonId, 'client');
  serviceId = await insertPlannedService(db, salon.salonId, { needsSkinTest: true, depositCents: 5000 });
  await insertNegativeSkinTest(db, salon.salonId, client.clientId!);
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
});
afterAll(() => t.close());

async function bookWednesday(key: string, date = wednesday): Promise<{ id: string; sittings: { start: string }[] }> {
  const res = await desk$.write('post', '/api/bookings', {
    clientId: client.clientId,
    serviceId,
    stepPlan: correctionPlan,
    stylistId: ana.staffId,
    start: localIso(date, '09:00'),
    idempotencyKey: key,
  });
  expect(res.status).toBe(201);
  return res.body;
}

describe('moving and cancelling a booking', () => {
  it('moves sitting 2 to another day in its range, and refuses a move that breaks the range or the hours, with the reason', async () => {
    const booking = await bookWednesday('move-key-0001');
    const friday = futureWeekday(5, 4);
    const moved = await desk$.write('post', `/api/bookings/${booking.id}/move`, { sitting: 2, start: localIso(friday, '14:00') });
    expect(moved.status).toBe(200);
    expect(moved.body.sittings[1].start).toBe(localIso(friday, '14:00').replace(/(T\d\d:\d\d)/, '$1:00'));

    const tooFar = await desk$.write('post', `/api/bookings/${booking.id}/move`, { sitting: 2, start: localIso(futureWeekday(5, 6), '10:00') });
    expect(tooFar.status).toBe(409);
    expect(tooFar.body.error.message).toMatch(/1–7 days after sitting 1/);

    const night = await desk$.write('post', `/api/bookings/${booking.id}/move`, { sitting: 2, start: localIso(friday, '17:00') });
    expect(night.status).toBe(409);
    expect(night.body.error.message).toMatch(/working hours/);

    const history = await desk$.get(`/api/bookings/${booking.id}/history`);
    expect(history.body.entries.map((e: { action: string }) => e.action)).toEqual(['booked', 'moved sitting 2']);
    expect(history.body.entries[1].before.sittings[1].start).not.toBe(history.body.entries[1].after.sittings[1].start);
    expect(history.body.entries[1].actor).toMatch(/front_desk/);
  });

  it('cancelling asks for a reason, frees the time, refunds the deposit well before the day, and cannot happen twice', async () => {
    const later = futureWeekday(3, 6);
    const booking = await bookWednesday('move-key-0002', later);
    expect((await desk$.write('post', `/api/bookings/${booking.id}/cancel`, { reason: '' })).status).toBe(400);
    const res = await desk$.write('post', `/api/bookings/${booking.id}/cancel`, { reason: 'Client moved away' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'cancelled', depositOutcome: 'refunded', cancelReason: 'Client moved away' });
    const again = await desk$.write('post', `/api/bookings/${booking.id}/cancel`, { reason: 'Twice' });
    expect(again.status).toBe(409);
    const move = await desk$.write('post', `/api/bookings/${booking.id}/move`, { sitting: 1, start: localIso(later, '10:00') });
    expect(move.status).toBe(409);
    // The freed time can be booked again.
    await bookWednesday('move-key-0003', later);
  });
});

describe('cancelling a skin test that a colour booking relies on', () => {
  it('is refused with the colour booking named, and the colour stays booked', async () => {
    const db = t.testDb.db;
    const skinTest = await insertPlannedService(db, salon.salonId, {
      category: 'skin_test',
      depositCents: 0,
      plan: { sittings: [{ steps: [{ kind: 'hands_on', label: 'Apply skin test', product: 'none', minutes: 15 }] }] },
    });
    const fresh = await insertUser(db, salon.salonId, 'client');
    const wed = futureWeekday(3, 8);
    const fri = futureWeekday(5, 8);
    const book = (service: string, plan: object, start: string, key: string) =>
      desk$.write('post', '/api/bookings', {
        clientId: fresh.clientId,
        serviceId: service,
        stepPlan: plan,
        stylistId: ana.staffId,
        start,
        idempotencyKey: key,
      });
    const test = await book(
      skinTest,
      { sittings: [{ steps: [{ kind: 'hands_on', label: 'Apply skin test', product: 'none', minutes: 15 }] }] },
      localIso(wed, '09:00'),
      'skin-dep-0001',
    );
    expect(test.status).toBe(201);
    // Friday 09:00 is exactly 48 h after Wednesday 09:00: allowed (lead time: common practice, Cosmetics Europe Rec. 27).
    const colour = await book(serviceId, correctionPlan, localIso(fri, '09:00'), 'skin-dep-0002');
    expect(colour.status).toBe(201);
    const cancel = await desk$.write('post', `/api/bookings/${test.body.id}/cancel`, { reason: 'Client asked' });
    expect(cancel.status).toBe(409);
    expect(cancel.body.error.code).toBe('SKIN_TEST');
    expect(cancel.body.error.message).toMatch(/rely on this skin test/);
    expect((await desk$.get(`/api/bookings/${test.body.id}`)).body.status).toBe('booked');
  });
});

describe('depositOutcome (the cancellation window)', () => {
  const first = new Date('2027-03-10T16:00:00Z');
  it('keeps the deposit inside the window and refunds it outside (48 h window: common practice)', () => {
    expect(depositOutcome(5000, first, new Date('2027-03-08T16:00:01Z'), 48)).toBe('kept');
    expect(depositOutcome(5000, first, new Date('2027-03-08T16:00:00Z'), 48)).toBe('refunded');
    expect(depositOutcome(0, first, new Date('2027-03-10T15:00:00Z'), 48)).toBeNull();
  });
});
