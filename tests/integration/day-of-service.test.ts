import { sql } from 'kysely';
import { DateTime } from 'luxon';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertNegativeSkinTest, insertPlannedService } from '../factories/service';
import { colourPlan, insertSittingAround, middayZone } from '../factories/day-of-service';

type Agent = Awaited<ReturnType<typeof signedInAgent>>;

let t: TestApp;
let salon: SalonFixture;
let serviceId: string;
let client: UserFixture;
let desk$: Agent;
let otherStylist$: Agent;
let otherSalonDesk$: Agent;

const db = () => t.testDb.db;
const sitting = (id: string, n = 1) => `/api/bookings/${id}/sittings/${n}`;
const step = (id: string, k: number, action: 'start' | 'finish') => `${sitting(id)}/steps/${k}/${action}`;

/**
 * A booked colour sitting planned to start `minutesAgo` minutes ago, with a stylist of its own (signed in) and by
 * default the tested client; each booking's own stylist keeps the tests' times from holding the same hands.
 */
async function book(minutesAgo: number, more: { clientId?: string; depositCents?: number } = {}) {
  const stylist = await insertUser(db(), salon.salonId, 'stylist');
  const id = await insertSittingAround(db(), {
    salonId: salon.salonId,
    serviceId,
    stylistId: stylist.staffId!,
    clientId: client.clientId!,
    minutesAgo,
    ...more,
  });
  return { id, stylist, stylist$: await signedInAgent(t.app, stylist.email, stylist.password) };
}

/** What is stored for the sitting and its steps, to show a refused tap stored nothing. */
async function stored(bookingId: string) {
  const b = await db().selectFrom('bookings').select(['status', 'deposit_outcome']).where('id', '=', bookingId).executeTakeFirstOrThrow();
  const s = await db()
    .selectFrom('sittings')
    .select(['id', 'status', 'arrived_at', 'late_minutes', 'live'])
    .where('booking_id', '=', bookingId)
    .executeTakeFirstOrThrow();
  const steps = await db()
    .selectFrom('booking_steps')
    .select(['seq', 'actual_start', 'actual_end', 'live'])
    .where('sitting_id', '=', s.id)
    .orderBy('seq')
    .execute();
  const taps = await db().selectFrom('sitting_taps').select(['action', 'undone_at']).where('sitting_id', '=', s.id).execute();
  return { booking: b, sitting: s, steps, taps };
}

beforeAll(async () => {
  t = await startTestApp();
  salon = await insertSalon(db(), { timeZone: middayZone() });
  serviceId = await insertPlannedService(db(), salon.salonId, { plan: colourPlan, depositCents: 3000 });
  const other = await insertUser(db(), salon.salonId, 'stylist');
  client = await insertUser(db(), salon.salonId, 'client');
  await insertNegativeSkinTest(db(), salon.salonId, client.clientId!);
  const desk = await insertUser(db(), salon.salonId, 'front_desk');
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
  otherStylist$ = await signedInAgent(t.app, other.email, other.password);
  const elsewhere = await insertSalon(db());
  const otherDesk = await insertUser(db(), elsewhere.salonId, 'front_desk');
  otherSalonDesk$ = await signedInAgent(t.app, otherDesk.email, otherDesk.password);
});
afterAll(() => t.close());

describe('arrival', () => {
  it('marks the sitting arrived with its minutes late, checks the booking in, and refuses a second arrival', async () => {
    const { id } = await book(10);
    const res = await desk$.write('post', `${sitting(id)}/arrive`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ booking: { id, status: 'checked_in' }, sitting: { seq: 1, of: 1, status: 'arrived' }, undo: { action: 'arrive' } });
    // Whole minutes from the first step's planned start to the arrival.
    const late = Math.floor((new Date(res.body.sitting.arrivedAt).getTime() - new Date(res.body.sitting.plannedStart).getTime()) / 60_000);
    expect(res.body.sitting.lateMinutes).toBe(late);
    expect(late).toBeGreaterThanOrEqual(10);
    expect(res.body.sitting.steps.map((s: { actualStart: string | null }) => s.actualStart)).toEqual([null, null, null]);
    // The book shows the arrival too.
    const view = await desk$.get(`/api/bookings/${id}`);
    expect(view.body.sittings[0]).toMatchObject({ status: 'arrived', lateMinutes: late });

    const again = await desk$.write('post', `${sitting(id)}/arrive`);
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/Sitting 1 was marked arrived at/);
  });

  it('an early client is not late', async () => {
    const { id } = await book(-30);
    const res = await desk$.write('post', `${sitting(id)}/arrive`);
    expect(res.body.sitting.lateMinutes).toBe(0);
  });

  it('is the desk’s: a stylist is refused by role, another salon’s desk finds no such booking; nothing stored', async () => {
    const { id, stylist$ } = await book(5);
    const byStylist = await stylist$.write('post', `${sitting(id)}/arrive`);
    expect(byStylist.status).toBe(403);
    const elsewhere = await otherSalonDesk$.write('post', `${sitting(id)}/arrive`);
    expect(elsewhere.status).toBe(404);
    expect((await stored(id)).sitting).toMatchObject({ status: 'booked', arrived_at: null });
  });

  it('re-checks the skin-test rule: no negative read test, no arrival, and the answer says why', async () => {
    const untested = await insertUser(db(), salon.salonId, 'client');
    const { id } = await book(3, { clientId: untested.clientId });
    const none = await desk$.write('post', `${sitting(id)}/arrive`);
    expect(none.status).toBe(409);
    expect(none.body.error.code).toBe('SKIN_TEST');
    expect(none.body.error.message).toMatch(/^Sitting 1 cannot start: .*skin test/i);

    // A test applied three days ago and not read yet: the booking could rest on it, the colour cannot start on it.
    await db()
      .insertInto('skin_tests')
      .values({ salon_id: salon.salonId, client_id: untested.clientId!, applied_at: new Date(Date.now() - 3 * 86_400_000), result: 'pending' })
      .execute();
    const waiting = await desk$.write('post', `${sitting(id)}/arrive`);
    expect(waiting.status).toBe(409);
    expect(waiting.body.error.message).toMatch(/has not been read yet/);
    expect((await stored(id)).sitting.status).toBe('booked');
  });

  it('refuses a sitting of a cancelled booking', async () => {
    const { id, stylist$ } = await book(-120);
    expect((await desk$.write('post', `/api/bookings/${id}/cancel`, { reason: 'Client is ill' })).status).toBe(200);
    const res = await desk$.write('post', `${sitting(id)}/arrive`);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/cancelled/);
    const start = await stylist$.write('post', step(id, 1, 'start'));
    expect(start.status).toBe(409);
  });
});

describe('steps', () => {
  it('the stylist taps a sitting through: each step keeps its planned and actual times, the last finishes the booking', async () => {
    const { id, stylist$ } = await book(2);
    const notYet = await stylist$.write('post', step(id, 1, 'start'));
    expect(notYet.status).toBe(409);
    expect(notYet.body.error.message).toMatch(/not marked arrived yet/);
    await desk$.write('post', `${sitting(id)}/arrive`);

    const started = await stylist$.write('post', step(id, 1, 'start'));
    expect(started.status).toBe(200);
    expect(started.body).toMatchObject({ booking: { status: 'checked_in' }, sitting: { status: 'in_progress' }, undo: { action: 'start' } });
    const first = started.body.sitting.steps[0];
    expect(first).toMatchObject({ seq: 1, kind: 'hands_on', label: 'Apply colour', product: 'oxidative_colour', actualEnd: null });
    expect(first.actualStart).not.toBeNull();
    expect(first.plannedEnd).not.toBe(first.plannedStart);

    for (const k of [1, 2, 3]) {
      if (k > 1) expect((await stylist$.write('post', step(id, k, 'start'))).status).toBe(200);
      const done = await stylist$.write('post', step(id, k, 'finish'));
      expect(done.status).toBe(200);
    }
    const after = await stored(id);
    expect(after.booking.status).toBe('finished');
    expect(after.sitting.status).toBe('finished');
    for (const s of after.steps) expect(s.actual_end!.getTime()).toBeGreaterThanOrEqual(s.actual_start!.getTime());

    const day = await stylist$.get('/api/stylist/day');
    const mine = day.body.bookings.find((b: { id: string }) => b.id === id);
    expect(mine.status).toBe('finished');
    expect(mine.sittings[0].steps.every((s: { actualStart: string | null; actualEnd: string | null }) => s.actualStart && s.actualEnd)).toBe(true);

    const history = await desk$.get(`/api/bookings/${id}/history`);
    const actions = history.body.entries.map((e: { action: string }) => e.action);
    expect(actions).toContain('started sitting 1 step 1 “Apply colour”');
    expect(actions).toContain('finished sitting 1 step 3 “Rinse” (sitting finished)');
    expect(actions.filter((a: string) => /^(arrived|started|finished)/.test(a))).toHaveLength(7);
  });

  it('refuses a step started twice, finished before it started, or out of order, with the reason and nothing stored', async () => {
    const { id, stylist$ } = await book(1);
    await desk$.write('post', `${sitting(id)}/arrive`);
    const outOfOrder = await stylist$.write('post', step(id, 2, 'start'));
    expect(outOfOrder.status).toBe(409);
    expect(outOfOrder.body.error.message).toBe('Step 1 “Apply colour” is not finished yet: finish it before starting step 2.');
    const finishFirst = await stylist$.write('post', step(id, 1, 'finish'));
    expect(finishFirst.status).toBe(409);
    expect(finishFirst.body.error.message).toMatch(/has not been started/);

    expect((await stylist$.write('post', step(id, 1, 'start'))).status).toBe(200);
    const before = await stored(id);
    const twice = await stylist$.write('post', step(id, 1, 'start'));
    expect(twice.status).toBe(409);
    expect(twice.body.error.message).toMatch(/^Step 1 “Apply colour” was already started at/);
    expect((await stylist$.write('post', step(id, 9, 'start'))).status).toBe(404);
    expect(await stored(id)).toEqual(before);
  });

  it('refuses a stylist who is not on the booking (403, nothing stored); the desk may tap for the stylist', async () => {
    const { id } = await book(0);
    await desk$.write('post', `${sitting(id)}/arrive`);
    const res = await otherStylist$.write('post', step(id, 1, 'start'));
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/own stylist/);
    expect((await stored(id)).steps[0]!.actual_start).toBeNull();
    expect((await desk$.write('post', step(id, 1, 'start'))).status).toBe(200);
    const elsewhere = await otherSalonDesk$.write('post', step(id, 1, 'finish'));
    expect(elsewhere.status).toBe(404);
  });

  it('finishing a sitting with steps left open needs leaveOpen and a reason; the step under way ends then', async () => {
    const { id, stylist$ } = await book(4);
    await desk$.write('post', `${sitting(id)}/arrive`);
    await stylist$.write('post', step(id, 1, 'start'));
    const plain = await stylist$.write('post', `${sitting(id)}/finish`, { leaveOpen: false });
    expect(plain.status).toBe(409);
    expect(plain.body.error.message).toMatch(/Steps 1, 2, 3 of sitting 1 are not finished/);
    const noReason = await stylist$.write('post', `${sitting(id)}/finish`, { leaveOpen: true });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.fields.reason).toBeTruthy();
    expect((await stored(id)).sitting.status).toBe('in_progress');

    const res = await stylist$.write('post', `${sitting(id)}/finish`, { leaveOpen: true, reason: 'Client had to leave for a school pickup' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      booking: { status: 'finished' },
      sitting: { status: 'finished', leftOpenReason: 'Client had to leave for a school pickup' },
    });
    const [first, second] = res.body.sitting.steps;
    expect(first.actualEnd).not.toBeNull();
    expect(second).toMatchObject({ actualStart: null, actualEnd: null });
  });
});

describe('undo', () => {
  it('undoes the last tap within the minute, once; the booking status follows', async () => {
    const { id, stylist$ } = await book(6);
    await desk$.write('post', `${sitting(id)}/arrive`);
    await stylist$.write('post', step(id, 1, 'start'));
    const undone = await stylist$.write('post', `${sitting(id)}/undo`);
    expect(undone.status).toBe(200);
    expect(undone.body).toMatchObject({ booking: { status: 'checked_in' }, sitting: { status: 'arrived' }, undo: null });
    expect(undone.body.sitting.steps[0].actualStart).toBeNull();
    const twice = await stylist$.write('post', `${sitting(id)}/undo`);
    expect(twice.status).toBe(409);
    expect(twice.body.error.message).toMatch(/no tap on sitting 1 to undo/);

    // The arrival itself, by the desk (a stylist may not undo the desk's tap).
    const { id: id2, stylist$: stylist2$ } = await book(7);
    await desk$.write('post', `${sitting(id2)}/arrive`);
    expect((await stylist2$.write('post', `${sitting(id2)}/undo`)).status).toBe(403);
    const back = await desk$.write('post', `${sitting(id2)}/undo`);
    expect(back.body).toMatchObject({ booking: { status: 'booked' }, sitting: { status: 'booked', arrivedAt: null, lateMinutes: null } });
    const history = await desk$.get(`/api/bookings/${id2}/history`);
    expect(history.body.entries.map((e: { action: string }) => e.action)).toContain('undid the arrival of sitting 1');
  });

  it('refuses after the minute, and stores nothing', async () => {
    const { id, stylist$ } = await book(8);
    await desk$.write('post', `${sitting(id)}/arrive`);
    await stylist$.write('post', step(id, 1, 'start'));
    const s = await stored(id);
    // Both taps a minute and more ago, in the order they were made.
    await db()
      .updateTable('sitting_taps')
      .set({ at: sql`at - interval '61 seconds'` })
      .where('sitting_id', '=', s.sitting.id)
      .execute();
    const before = await stored(id);
    const late = await stylist$.write('post', `${sitting(id)}/undo`);
    expect(late.status).toBe(409);
    expect(late.body.error.message).toMatch(/more than a minute ago/);
    expect(await stored(id)).toEqual(before);
  });
});

describe('no-show', () => {
  it('waits for the grace time past the planned start (15 minutes by default)', async () => {
    const { id } = await book(10);
    const early = await desk$.write('post', `${sitting(id)}/no-show`);
    expect(early.status).toBe(409);
    expect(early.body.error.message).toMatch(/^A no-show can be marked from .*, 15 minutes after the planned start/);
    const view = await desk$.get(`/api/bookings/${id}`);
    expect(new Date(view.body.sittings[0].noShowFrom).getTime() - new Date(view.body.sittings[0].start).getTime()).toBe(15 * 60_000);
    expect((await stored(id)).sitting).toMatchObject({ status: 'booked', live: true });
  });

  it('keeps the deposit by the policy, frees the time, tells the client once, and counts in the owner’s figures', async () => {
    const booked = await book(20, { depositCents: 3000 });
    const { id } = booked;
    const res = await desk$.write('post', `${sitting(id)}/no-show`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ booking: { status: 'no_show' }, sitting: { status: 'no_show' }, undo: null });
    const after = await stored(id);
    expect(after.booking.deposit_outcome).toBe('kept');
    expect(after.sitting.live).toBe(false);
    expect(after.steps.every((s) => !s.live)).toBe(true);

    // One message to the client (their e-mail; no phone on record), through the send log.
    const messages = await db()
      .selectFrom('messages')
      .select(['kind', 'channel', 'body'])
      .where('client_id', '=', client.clientId!)
      .where('kind', '=', 'no_show')
      .execute();
    expect(messages).toHaveLength(1);
    expect(messages[0]!.body).toMatch(/we missed you .* the \$30\.00 deposit is kept/);

    // The freed time: the same stylist's hands can be booked again then (the exclusion constraint no longer holds it).
    const { stylist } = booked;
    await expect(
      insertSittingAround(db(), { salonId: salon.salonId, serviceId, stylistId: stylist.staffId!, clientId: client.clientId!, minutesAgo: 20 }),
    ).resolves.toBeTruthy();

    // No second mark, no undo, no arrival afterwards.
    expect((await desk$.write('post', `${sitting(id)}/no-show`)).status).toBe(409);
    expect((await desk$.write('post', `${sitting(id)}/undo`)).body.error.message).toBe('Sitting 1 was marked a no-show.');
    expect((await desk$.write('post', `${sitting(id)}/arrive`)).status).toBe(409);
    expect(await db().selectFrom('messages').select('id').where('client_id', '=', client.clientId!).where('kind', '=', 'no_show').execute()).toHaveLength(1);

    const owner = await insertUser(db(), salon.salonId, 'owner');
    const owner$ = await signedInAgent(t.app, owner.email, owner.password);
    const today = DateTime.now().setZone(middayZone()).toISODate();
    const figures = await owner$.get(`/api/owner/utilisation?period=custom&from=${today}&to=${today}`);
    expect(figures.status, JSON.stringify(figures.body)).toBe(200);
    expect(figures.body.attendance.noShows).toBeGreaterThanOrEqual(1);
  });

  it('refunds when the salon keeps nothing, and follows the salon’s grace setting', async () => {
    await db().updateTable('salons').set({ cancellation_keeps: 'nothing', no_show_grace_minutes: 30 }).where('id', '=', salon.salonId).execute();
    try {
      const { id } = await book(25);
      const early = await desk$.write('post', `${sitting(id)}/no-show`);
      expect(early.status).toBe(409);
      expect(early.body.error.message).toMatch(/30 minutes after the planned start/);
      const { id: id2 } = await book(35);
      const res = await desk$.write('post', `${sitting(id2)}/no-show`);
      expect(res.status).toBe(200);
      expect((await stored(id2)).booking.deposit_outcome).toBe('refunded');
    } finally {
      await db().updateTable('salons').set({ cancellation_keeps: 'deposit', no_show_grace_minutes: 15 }).where('id', '=', salon.salonId).execute();
    }
  });

  it('is refused once the client has arrived', async () => {
    const { id } = await book(40);
    await desk$.write('post', `${sitting(id)}/arrive`);
    const res = await desk$.write('post', `${sitting(id)}/no-show`);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/was marked arrived at .*: it cannot be marked a no-show now/);
  });
});
