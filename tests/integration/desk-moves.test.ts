import { DateTime } from 'luxon';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon } from '../factories/salon';
import { insertUser } from '../factories/user';
import { correctionPlan, insertNegativeSkinTest, insertPlannedService, tonerPlan } from '../factories/service';
import { futureWeekday, localIso } from '../setup/dates';

// The desk's moves and cancellations: the free times offered for a move are the ones the move accepts, a moved
// sitting keeps its chair while that chair is free, a refused move says why, and the deposit terms read before
// cancelling are what the cancel then does. The salon (factories/salon.ts) opens Tuesday to Saturday 09:00–21:00
// in America/Denver; a stylist (factories/user.ts) works Tuesday to Saturday 09:00–18:00.

type Agent = Awaited<ReturnType<typeof signedInAgent>>;
type FreeTime = { start: string; end: string; stylistId: string };
const ZONE = 'America/Denver';
const HOUR = 3_600_000;
const local = (iso: string) => DateTime.fromISO(iso, { zone: ZONE });
const sameInstant = (a: string, b: string) => Date.parse(a) === Date.parse(b);

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

/** A salon of its own per block, so a policy changed in one (the cancellation window) does not reach another. */
async function salonWithDesk(chairs = 2) {
  const db = t.testDb.db;
  const salon = await insertSalon(db, { chairs, basins: 1 });
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  const ana = await insertUser(db, salon.salonId, 'stylist');
  const bo = await insertUser(db, salon.salonId, 'stylist');
  const client = await insertUser(db, salon.salonId, 'client');
  const desk$ = await signedInAgent(t.app, desk.email, desk.password);
  return { salon, ana, bo, client, desk$ };
}

async function book(desk$: Agent, body: { clientId: string; serviceId: string; stepPlan: object; stylistId: string; start: string; chairIds?: string[] }) {
  const res = await desk$.write('post', '/api/bookings', { ...body, idempotencyKey: `desk-moves-${Date.now()}-${Math.random()}` });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { id: string; sittings: { start: string; chairId: string; chairName: string }[] };
}

describe('free times to move a sitting to (desk)', () => {
  let s: Awaited<ReturnType<typeof salonWithDesk>>;
  let toner: string;
  let correction: string;
  const wednesday = futureWeekday(3, 3);

  beforeAll(async () => {
    s = await salonWithDesk();
    toner = await insertPlannedService(t.testDb.db, s.salon.salonId, { plan: tonerPlan, depositCents: 0 });
    correction = await insertPlannedService(t.testDb.db, s.salon.salonId, { depositCents: 0 });
  });

  it('offers only times inside the stylist’s working hours, each one the move then accepts', async () => {
    const booked = await book(s.desk$, {
      clientId: s.client.clientId!,
      serviceId: toner,
      stepPlan: tonerPlan,
      stylistId: s.ana.staffId!,
      start: localIso(wednesday, '09:00'),
    });
    const res = await s.desk$.get(`/api/bookings/${booked.id}/move-times?from=${wednesday}`);
    expect(res.status).toBe(200);
    const times = res.body.times as FreeTime[];
    expect(times.length).toBeGreaterThan(10);
    // Its own time is not offered: moving there would change nothing.
    expect(times.map((x) => Date.parse(x.start))).not.toContain(Date.parse(localIso(wednesday, '09:00')));
    // The toner takes at least 10 + 10 + 10 = 30 minutes (factories/service.ts), and the stylist works 09:00–18:00.
    for (const time of times) {
      expect(time.stylistId).toBe(s.ana.staffId);
      expect(local(time.start).toFormat('HH:mm') >= '09:00').toBe(true);
      expect(local(time.end).toFormat('HH:mm') <= '18:00').toBe(true);
      expect(local(time.start).minute % 5).toBe(0); // the salon's 5-minute grid (migration default)
    }
    // A few of them, early, middle and late, are each accepted by the move itself.
    for (const time of [times[times.length - 1]!, times[Math.floor(times.length / 2)]!, times[0]!]) {
      const moved = await s.desk$.write('post', `/api/bookings/${booked.id}/move`, { sitting: 1, start: time.start });
      expect(moved.status, JSON.stringify(moved.body)).toBe(200);
      expect(sameInstant(moved.body.sittings[0].start, time.start)).toBe(true);
    }
  });

  it('leaves out a time the stylist’s hands are taken, and a move there is refused with that reason', async () => {
    const thursday = futureWeekday(4, 3);
    const booked = await book(s.desk$, {
      clientId: s.client.clientId!,
      serviceId: toner,
      stepPlan: tonerPlan,
      stylistId: s.ana.staffId!,
      start: localIso(thursday, '15:00'),
    });
    const other = await insertUser(t.testDb.db, s.salon.salonId, 'client');
    // Another client's toner at 10:00 holds Ana's hands 10:00–10:10 (its first step is hands-on).
    await book(s.desk$, { clientId: other.clientId!, serviceId: toner, stepPlan: tonerPlan, stylistId: s.ana.staffId!, start: localIso(thursday, '10:00') });
    const res = await s.desk$.get(`/api/bookings/${booked.id}/move-times?from=${thursday}`);
    const starts = (res.body.times as FreeTime[]).map((x) => Date.parse(x.start));
    expect(starts).not.toContain(Date.parse(localIso(thursday, '10:00')));
    expect(starts).toContain(Date.parse(localIso(thursday, '09:00')));
    const refused = await s.desk$.write('post', `/api/bookings/${booked.id}/move`, { sitting: 1, start: localIso(thursday, '10:00') });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/stylist is busy then/);
    const closed = await s.desk$.write('post', `/api/bookings/${booked.id}/move`, { sitting: 1, start: localIso(futureWeekday(1, 3), '10:00') });
    expect(closed.status).toBe(409);
    expect(closed.body.error.message).toMatch(/outside the salon's opening hours/);
  });

  it('for a later sitting, starts at the first day its range allows and keeps every time inside the range', async () => {
    const booked = await book(s.desk$, {
      clientId: s.client.clientId!,
      serviceId: correction,
      stepPlan: correctionPlan,
      stylistId: s.ana.staffId!,
      start: localIso(futureWeekday(3, 4), '09:00'),
    });
    const first = local(booked.sittings[0]!.start).startOf('day');
    const res = await s.desk$.get(`/api/bookings/${booked.id}/move-times?sitting=2`);
    expect(res.status).toBe(200);
    const times = res.body.times as FreeTime[];
    expect(times.length).toBeGreaterThan(0);
    // correctionPlan: sitting 2 is 1–7 days after sitting 1.
    for (const time of times) {
      const days = Math.round(local(time.start).startOf('day').diff(first, 'days').days);
      expect(days).toBeGreaterThanOrEqual(1);
      expect(days).toBeLessThanOrEqual(7);
    }
    expect(local(times[0]!.start).toISODate()).toBe(first.plus({ days: 1 }).toISODate());
  });

  it('refuses what the move refuses, naming the field: another stylist for several sittings, a stylist without the skill, a sitting it does not have', async () => {
    const booked = await book(s.desk$, {
      clientId: s.client.clientId!,
      serviceId: correction,
      stepPlan: correctionPlan,
      stylistId: s.ana.staffId!,
      start: localIso(futureWeekday(3, 5), '09:00'),
    });
    const several = await s.desk$.get(`/api/bookings/${booked.id}/move-times?stylistId=${s.bo.staffId}`);
    expect(several.status).toBe(400);
    expect(several.body.error.fields.stylistId).toMatch(/one stylist/);
    const third = await s.desk$.get(`/api/bookings/${booked.id}/move-times?sitting=3`);
    expect(third.status).toBe(400);
    expect(third.body.error.fields.sitting).toMatch(/2 sitting/);

    const cutter = await insertUser(t.testDb.db, s.salon.salonId, 'stylist', { skills: ['cut'] });
    const one = await book(s.desk$, {
      clientId: s.client.clientId!,
      serviceId: toner,
      stepPlan: tonerPlan,
      stylistId: s.ana.staffId!,
      start: localIso(futureWeekday(5, 3), '09:00'),
    });
    const noSkill = await s.desk$.get(`/api/bookings/${one.id}/move-times?stylistId=${cutter.staffId}`);
    expect(noSkill.status).toBe(400);
    expect(noSkill.body.error.fields.stylistId).toMatch(/does not have the "colour" skill/);
    const moveNoSkill = await s.desk$.write('post', `/api/bookings/${one.id}/move`, {
      sitting: 1,
      start: localIso(futureWeekday(5, 3), '11:00'),
      stylistId: cutter.staffId,
    });
    expect(moveNoSkill.status).toBe(400);
    expect(moveNoSkill.body.error.fields.stylistId).toMatch(/skill/);
    // With a stylist who has the skill, the times are theirs.
    const withBo = await s.desk$.get(`/api/bookings/${one.id}/move-times?stylistId=${s.bo.staffId}`);
    expect(withBo.status).toBe(200);
    expect((withBo.body.times as FreeTime[]).every((x) => x.stylistId === s.bo.staffId)).toBe(true);
  });

  it('answers hostile or malformed queries with 400 naming the field, and a cancelled booking with 409', async () => {
    const one = await book(s.desk$, {
      clientId: s.client.clientId!,
      serviceId: toner,
      stepPlan: tonerPlan,
      stylistId: s.ana.staffId!,
      start: localIso(futureWeekday(6, 3), '09:00'),
    });
    const cases: [string, string][] = [
      ['sitting=0', 'sitting'],
      ['sitting=99999999999999999999', 'sitting'],
      ['sitting=1%00', 'sitting'],
      ['from=2027-02-30', 'from'],
      ['from=%ED%A0%80', 'from'],
      ['stylistId=not-an-id', 'stylistId'],
      ['sitting=1&sitting=2', 'sitting'],
    ];
    for (const [query, field] of cases) {
      const res = await s.desk$.get(`/api/bookings/${one.id}/move-times?${query}`);
      expect(res.status, query).toBe(400);
      expect(JSON.stringify(res.body.error), query).toContain(field);
    }
    expect((await s.desk$.get(`/api/bookings/${one.id}/move-times?colour=red`)).status).toBe(400);
    expect((await s.desk$.write('post', `/api/bookings/${one.id}/cancel`, { reason: 'Client asked' })).status).toBe(200);
    const cancelled = await s.desk$.get(`/api/bookings/${one.id}/move-times`);
    expect(cancelled.status).toBe(409);
    expect(cancelled.body.error.message).toMatch(/cancelled booking cannot be moved/);
  });
});

describe('a moved sitting keeps its chair while that chair is free', () => {
  it('stays in its chair, changes chair only when its own is taken, and an undo naming the old chair puts it back', async () => {
    const s = await salonWithDesk(2);
    const toner = await insertPlannedService(t.testDb.db, s.salon.salonId, { plan: tonerPlan, depositCents: 0 });
    const friday = futureWeekday(5, 4);
    const chair1 = s.salon.chairs[0]!;
    const chair2 = s.salon.chairs[1]!;
    // Booked in Chair 2 on purpose: the engine, left alone, picks Chair 1 (the first free chair by name).
    const booked = await book(s.desk$, {
      clientId: s.client.clientId!,
      serviceId: toner,
      stepPlan: tonerPlan,
      stylistId: s.ana.staffId!,
      start: localIso(friday, '09:00'),
      chairIds: [chair2],
    });
    expect(booked.sittings[0]!.chairId).toBe(chair2);

    const later = await s.desk$.write('post', `/api/bookings/${booked.id}/move`, { sitting: 1, start: localIso(friday, '11:00') });
    expect(later.status).toBe(200);
    expect(later.body.sittings[0]).toMatchObject({ chairId: chair2, chairName: 'Chair 2' });
    // Half an hour later overlaps its own old time: the sitting does not stand in its own way.
    const overlapping = await s.desk$.write('post', `/api/bookings/${booked.id}/move`, { sitting: 1, start: localIso(friday, '11:15') });
    expect(overlapping.body.sittings[0].chairId).toBe(chair2);

    // Bo's client takes Chair 2 at 14:00; moving there puts the sitting in Chair 1 and says so by the chair it answers.
    const other = await insertUser(t.testDb.db, s.salon.salonId, 'client');
    await book(s.desk$, {
      clientId: other.clientId!,
      serviceId: toner,
      stepPlan: tonerPlan,
      stylistId: s.bo.staffId!,
      start: localIso(friday, '14:00'),
      chairIds: [chair2],
    });
    const taken = await s.desk$.write('post', `/api/bookings/${booked.id}/move`, { sitting: 1, start: localIso(friday, '14:00') });
    expect(taken.status).toBe(200);
    expect(taken.body.sittings[0]).toMatchObject({ chairId: chair1, chairName: 'Chair 1' });

    // Undo: back to 11:15, naming Chair 2, which is free then again.
    const undo = await s.desk$.write('post', `/api/bookings/${booked.id}/move`, { sitting: 1, start: localIso(friday, '11:15'), chairId: chair2 });
    expect(undo.status).toBe(200);
    expect(undo.body.sittings[0].chairId).toBe(chair2);
    expect(sameInstant(undo.body.sittings[0].start, localIso(friday, '11:15'))).toBe(true);

    // A chair out of service that day is never kept (nor one of another salon).
    const fridayStart = DateTime.fromISO(friday, { zone: ZONE });
    await t.testDb.db
      .insertInto('out_of_service')
      .values({ salon_id: s.salon.salonId, chair_id: chair2, during: `[${fridayStart.toISO()},${fridayStart.plus({ days: 1 }).toISO()})` })
      .execute();
    const closedChair = await s.desk$.write('post', `/api/bookings/${booked.id}/move`, { sitting: 1, start: localIso(friday, '16:00'), chairId: chair2 });
    expect(closedChair.status).toBe(200);
    expect(closedChair.body.sittings[0].chairId).toBe(chair1);
    const elsewhere = await insertSalon(t.testDb.db, { chairs: 1 });
    const foreign = await s.desk$.write('post', `/api/bookings/${booked.id}/move`, {
      sitting: 1,
      start: localIso(friday, '16:30'),
      chairId: elsewhere.chairs[0],
    });
    expect(foreign.status).toBe(200);
    expect(foreign.body.sittings[0].chairId).toBe(chair1);

    // The history writes each move with the sitting's chair before and after.
    const history = (await s.desk$.get(`/api/bookings/${booked.id}/history`)).body.entries as {
      action: string;
      before: { sittings: { chair: string }[] };
      after: { sittings: { chair: string }[] };
    }[];
    const toChair1 = history.find((e) => e.before?.sittings[0]!.chair === 'Chair 2' && e.after?.sittings[0]!.chair === 'Chair 1');
    expect(toChair1?.action).toBe('moved sitting 1');
  });
});

describe('what cancelling does to the deposit, read before confirming (desk)', () => {
  let s: Awaited<ReturnType<typeof salonWithDesk>>;
  let colour: string;
  let slot = 0;
  /**
   * A colour booking with a $50.00 deposit (factories/service.ts: 5000 cents) on its own weekday three weeks ahead:
   * between 15 and 27 days away, so outside a 48-hour window and inside a 720-hour (30-day) one. At noon: the
   * engine puts each one's second sitting at 09:00 on a following day.
   */
  const colourBooking = async (clientId = s.client.clientId!) =>
    book(s.desk$, {
      clientId,
      serviceId: colour,
      stepPlan: correctionPlan,
      stylistId: s.ana.staffId!,
      start: localIso(futureWeekday((2 + (slot++ % 5)) as 2 | 3 | 4 | 5 | 6, 3), '12:00'),
    });
  const setPolicy = (window: number, keeps: 'deposit' | 'nothing' = 'deposit') =>
    t.testDb.db.updateTable('salons').set({ cancellation_window_hours: window, cancellation_keeps: keeps }).where('id', '=', s.salon.salonId).execute();

  beforeAll(async () => {
    s = await salonWithDesk(4);
    colour = await insertPlannedService(t.testDb.db, s.salon.salonId, { needsSkinTest: true, depositCents: 5000 });
    await insertNegativeSkinTest(t.testDb.db, s.salon.salonId, s.client.clientId!);
  });

  it('outside the cancellation window: refunded, with the window named; the cancel then refunds', async () => {
    await setPolicy(48);
    const booked = await colourBooking();
    const terms = await s.desk$.get(`/api/bookings/${booked.id}/cancel-terms`);
    expect(terms.status).toBe(200);
    expect(terms.body).toMatchObject({ depositOutcome: 'refunded', why: 'outside_window' });
    expect(terms.body.message).toBe(
      "The $50.00 deposit is refunded: the first sitting is more than 48 hours away, outside the salon's 48-hour cancellation window.",
    );
    const cancelled = await s.desk$.write('post', `/api/bookings/${booked.id}/cancel`, { reason: 'Client asked' });
    expect(cancelled.body.depositOutcome).toBe('refunded');
    expect((await s.desk$.get(`/api/bookings/${booked.id}/cancel-terms`)).status).toBe(409);
  });

  it('inside the window: kept; the same booking is refunded in full once the skin-test record blocks it', async () => {
    // 720 hours (30 days, the largest window the salon settings allow) reaches the booking about three weeks ahead.
    await setPolicy(720);
    const reacting = await insertUser(t.testDb.db, s.salon.salonId, 'client');
    await insertNegativeSkinTest(t.testDb.db, s.salon.salonId, reacting.clientId!);
    const booked = await colourBooking(reacting.clientId!);
    const kept = await s.desk$.get(`/api/bookings/${booked.id}/cancel-terms`);
    expect(kept.body).toMatchObject({ depositOutcome: 'kept', why: 'inside_window' });
    expect(kept.body.message).toMatch(/^The \$50\.00 deposit is kept: the first sitting is less than 720 hours away/);

    // A new test reads positive (a reaction): the record now blocks this colour.
    const recorded = await s.desk$.write('post', `/api/clients/${reacting.clientId!}/skin-tests`, {
      appliedAt: new Date(Date.now() - 3 * 24 * HOUR).toISOString(),
      readAt: new Date(Date.now() - 24 * HOUR).toISOString(),
      result: 'positive',
      product: 'Permanent colour with 6 % developer',
      notes: 'Redness behind the ear',
    });
    expect(recorded.status).toBe(201);
    const blocked = await s.desk$.get(`/api/bookings/${booked.id}/cancel-terms`);
    expect(blocked.body).toMatchObject({ depositOutcome: 'refunded', why: 'skin_test_blocked' });
    expect(blocked.body.message).toMatch(/refunded in full: the client's skin-test record no longer allows this colour/);

    // The client reads the same outcome on their own booking.
    const client$ = await signedInAgent(t.app, reacting.email, reacting.password);
    const theirs = await client$.get(`/api/me/bookings/${booked.id}/cancel-terms`);
    expect(theirs.body).toMatchObject({ depositOutcome: 'refunded', why: 'skin_test_blocked' });
    expect(theirs.body.message).toMatch(/refunded in full/);

    const cancelled = await s.desk$.write('post', `/api/bookings/${booked.id}/cancel`, { reason: 'Skin test showed a reaction' });
    expect(cancelled.body.depositOutcome).toBe('refunded');
  });

  it('a salon that keeps nothing refunds; no deposit and a hold not paid yet have nothing to keep or refund', async () => {
    await setPolicy(720, 'nothing');
    const nothing = await colourBooking();
    expect((await s.desk$.get(`/api/bookings/${nothing.id}/cancel-terms`)).body).toMatchObject({ depositOutcome: 'refunded', why: 'salon_keeps_nothing' });

    await setPolicy(720);
    const free = await colourBooking();
    await t.testDb.db.updateTable('bookings').set({ deposit_cents: 0 }).where('id', '=', free.id).execute();
    expect((await s.desk$.get(`/api/bookings/${free.id}/cancel-terms`)).body).toMatchObject({
      depositOutcome: null,
      why: 'no_deposit',
      message: 'There is no deposit on this booking.',
    });

    const held = await colourBooking();
    await t.testDb.db
      .updateTable('bookings')
      .set({ status: 'held', held_until: new Date(Date.now() + HOUR) })
      .where('id', '=', held.id)
      .execute();
    expect((await s.desk$.get(`/api/bookings/${held.id}/cancel-terms`)).body).toMatchObject({ depositOutcome: null, why: 'not_paid' });
    const cancelled = await s.desk$.write('post', `/api/bookings/${held.id}/cancel`, { reason: 'Left unpaid' });
    expect(cancelled.body.depositOutcome).toBeNull();
  });
});

describe('the day book and the week carry the salon’s opening hours', () => {
  it('open Tuesday to Saturday 09:00–21:00, closed on Monday, Sunday and a closed date, and a change to the hours shows at once', async () => {
    const s = await salonWithDesk();
    const monday = futureWeekday(1, 2);
    const tuesday = futureWeekday(2, 2);
    const day = await s.desk$.get(`/api/desk/day?date=${tuesday}`);
    expect(day.body.hours).toEqual([{ start: '09:00', end: '21:00' }]);
    expect((await s.desk$.get(`/api/desk/day?date=${monday}`)).body.hours).toEqual([]);

    const week = await s.desk$.get(`/api/desk/week?date=${tuesday}`);
    expect(week.body.days.map((d: { date: string }) => d.date)[0]).toBe(monday);
    expect(week.body.days.map((d: { hours: unknown[] }) => d.hours.length)).toEqual([0, 1, 1, 1, 1, 1, 0]);

    // A closed date (EXDATE, RFC 5545 §3.8.5.1) on the Thursday, and Saturday closing at 17:00: both read at once,
    // though the week was just answered from the read cache (the hours move the book version).
    const thursday = futureWeekday(4, 2);
    await t.testDb.db.deleteFrom('salon_hours').where('salon_id', '=', s.salon.salonId).execute();
    await t.testDb.db
      .insertInto('salon_hours')
      .values([
        {
          salon_id: s.salon.salonId,
          rrule: `RRULE:FREQ=WEEKLY;BYDAY=TU,WE,TH,FR\nEXDATE;VALUE=DATE:${thursday.replaceAll('-', '')}`,
          start_time: '09:00',
          end_time: '21:00',
        },
        { salon_id: s.salon.salonId, rrule: 'FREQ=WEEKLY;BYDAY=SA', start_time: '09:00', end_time: '17:00' },
      ])
      .execute();
    const after = await s.desk$.get(`/api/desk/week?date=${tuesday}`);
    expect(after.body.days.map((d: { hours: { end: string }[] }) => d.hours.map((h) => h.end).join())).toEqual([
      '',
      '21:00',
      '21:00',
      '',
      '21:00',
      '17:00',
      '',
    ]);
    expect((await s.desk$.get(`/api/desk/day?date=${thursday}`)).body.hours).toEqual([]);
  });
});

describe('a time held online', () => {
  it('is recorded as held online, by nobody in particular', async () => {
    const s = await salonWithDesk();
    const db = t.testDb.db;
    const slug = (await db.selectFrom('salons').select('slug').where('id', '=', s.salon.salonId).executeTakeFirstOrThrow()).slug;
    const consultation = await insertPlannedService(db, s.salon.salonId, {
      plan: { sittings: [{ steps: [{ kind: 'hands_on', label: 'Consultation', product: 'none', minutes: 30 }] }] },
      depositCents: 2500,
    });
    await db.updateTable('services').set({ online_bookable: true, category: 'consultation' }).where('id', '=', consultation).execute();
    const visitor = await anonymousAgent(t.app);
    const held = await visitor.write('post', '/api/public/holds', {
      salonSlug: slug,
      serviceId: consultation,
      stylistId: s.ana.staffId,
      start: localIso(futureWeekday(2, 3), '10:00'),
    });
    expect(held.status).toBe(201);
    const history = await s.desk$.get(`/api/bookings/${held.body.holdId}/history`);
    expect(history.body.entries).toMatchObject([{ action: 'held online', actor: null, after: { status: 'held' } }]);
  });
});
