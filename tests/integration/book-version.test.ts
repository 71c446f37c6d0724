// Calendar reads and free times are cached per app server under the salon's book version, which
// PostgreSQL triggers move with every change those reads depend on. These checks run two app servers
// (two createApp instances, each with its own cache) on one database, as docs/scaling.md describes.
import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '@server/app';
import { loadConfig } from '@server/config';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { correctionPlan, insertPlannedService } from '../factories/service';
import { futureWeekday } from '../setup/dates';

let t: TestApp;
let other: ReturnType<typeof createApp>;
let salon: SalonFixture;
let slug: string;
let desk: UserFixture;
let ana: UserFixture;
let client: UserFixture;
let correction: string;
let toner: string;
const tuesday = futureWeekday(2, 3);

/** The salon's own number and each date's, as the triggers left them. */
async function versions(salonId = salon.salonId) {
  const db = t.testDb.db;
  const own = Number((await db.selectFrom('book_versions').select('version').where('salon_id', '=', salonId).executeTakeFirst())?.version ?? 0);
  const rows = await sql<{ day: string; version: string }>`select day::text as day, version from book_day_versions where salon_id = ${salonId}`.execute(db);
  return { own, days: new Map(rows.rows.map((r) => [r.day, Number(r.version)])) };
}
/** Everything together: it grows whenever anything any read depends on changes. */
const version = async (salonId = salon.salonId) => {
  const v = await versions(salonId);
  return v.own + [...v.days.values()].reduce((a, b) => a + b, 0);
};

beforeAll(async () => {
  t = await startTestApp();
  const config = loadConfig({ DATABASE_URL: t.testDb.url, DWELL_MODE: 'test', UPLOADS_DIR: t.uploadsDir });
  other = createApp({ db: t.testDb.db, pool: t.testDb.pool, config, jobs: t.jobs, ...t.outside });
  const db = t.testDb.db;
  salon = await insertSalon(db, { chairs: 2, basins: 1 });
  slug = (await db.selectFrom('salons').select('slug').where('id', '=', salon.salonId).executeTakeFirstOrThrow()).slug;
  desk = await insertUser(db, salon.salonId, 'front_desk');
  ana = await insertUser(db, salon.salonId, 'stylist', { skills: ['colour'] });
  client = await insertUser(db, salon.salonId, 'client');
  correction = await insertPlannedService(db, salon.salonId);
  toner = await insertPlannedService(db, salon.salonId, {
    name: 'Toner refresh',
    plan: { sittings: [{ steps: [{ kind: 'hands_on', label: 'Apply toner', product: 'toner_direct', minutes: 30 }] }] },
  });
  await db.updateTable('services').set({ online_bookable: true }).where('id', '=', toner).execute();
});
afterAll(() => t.close());

const book = (
  agent: Awaited<ReturnType<typeof signedInAgent>>,
  start: string,
  serviceId = toner,
  plan: object = { sittings: [{ steps: [{ kind: 'hands_on', label: 'Apply toner', product: 'toner_direct', minutes: 30 }] }] },
) =>
  agent.write('post', '/api/bookings', {
    clientId: client.clientId,
    serviceId,
    stepPlan: plan,
    stylistId: ana.staffId,
    start,
    idempotencyKey: crypto.randomUUID(),
  });

describe('the book version', () => {
  it('moves exactly once for a booking with two sittings and eight steps, and not for a write that rolled back or one calendars do not show', async () => {
    const desk$ = await signedInAgent(t.app, desk.email, desk.password);
    const option = (
      await desk$.write('post', '/api/booking-options', {
        clientId: client.clientId,
        serviceId: correction,
        stepPlan: correctionPlan,
        stylistId: ana.staffId,
        earliestDate: tuesday,
      })
    ).body.options[0];
    const before = await versions();
    expect((await book(desk$, option.sittings[0].start, correction, correctionPlan)).status).toBe(201);
    const after = await versions();
    // Each date a sitting is on moved once (not once per step); no other date and not the salon's own number.
    const dates = option.sittings.map((x: { start: string }) => x.start.slice(0, 10));
    const moved = [...after.days].filter(([day, n]) => n !== (before.days.get(day) ?? 0));
    expect(moved.map(([day]) => day).sort()).toEqual([...dates].sort());
    expect(moved.every(([day, n]) => n === (before.days.get(day) ?? 0) + 1)).toBe(true);
    expect(after.own).toBe(before.own);
    const total = await version();

    await t.testDb.db
      .transaction()
      .execute(async (trx) => {
        await trx.updateTable('clients').set({ name: 'Renamed, then rolled back' }).where('id', '=', client.clientId!).execute();
        throw new Error('roll back');
      })
      .catch(() => undefined);
    expect(await version()).toBe(total);
    // The audit log and the send log are not part of any calendar.
    await sql`update messages set attempts = attempts where salon_id = ${salon.salonId}`.execute(t.testDb.db);
    await t.testDb.db
      .insertInto('audit_log')
      .values({ salon_id: salon.salonId, entity: 'client', entity_id: client.clientId!, action: 'note', after: JSON.stringify({}) })
      .execute();
    expect(await version()).toBe(total);
  });

  it('moves for every kind of change a calendar or a free-time search depends on, and only for that salon', async () => {
    const db = t.testDb.db;
    const elsewhere = await insertSalon(db);
    const changes: [string, () => Promise<unknown>][] = [
      ['salon settings', () => db.updateTable('salons').set({ name: 'Test Salon (renamed)' }).where('id', '=', salon.salonId).execute()],
      ['salon hours', () => db.updateTable('salon_hours').set({ end_time: '20:00' }).where('salon_id', '=', salon.salonId).execute()],
      ['stylist name', () => db.updateTable('staff').set({ display_name: 'Ana R.' }).where('id', '=', ana.staffId!).execute()],
      [
        'stylist hours',
        () => db.insertInto('staff_hours').values({ staff_id: ana.staffId!, rrule: 'FREQ=WEEKLY;BYDAY=SU', start_time: '10:00', end_time: '14:00' }).execute(),
      ],
      [
        'time off',
        () =>
          db
            .insertInto('time_off')
            .values({ staff_id: ana.staffId!, during: sql`tstzrange(now() + interval '40 days', now() + interval '41 days')` as never })
            .execute(),
      ],
      ['chair', () => db.updateTable('chairs').set({ name: 'Window chair' }).where('id', '=', salon.chairs[0]!).execute()],
      ['basin', () => db.updateTable('basins').set({ name: 'Back basin' }).where('id', '=', salon.basins[0]!).execute()],
      [
        'out of service',
        () =>
          db
            .insertInto('out_of_service')
            .values({
              salon_id: salon.salonId,
              chair_id: salon.chairs[1],
              during: sql`tstzrange(now() + interval '50 days', now() + interval '51 days')` as never,
            })
            .execute(),
      ],
      ['service', () => db.updateTable('services').set({ name: 'Toner refresh (gloss)' }).where('id', '=', toner).execute()],
      ['client name', () => db.updateTable('clients').set({ name: 'Client Renamed' }).where('id', '=', client.clientId!).execute()],
      [
        // A booking's deposit shows on the book (due, paid, refunded): a payment moves its dates.
        'a payment',
        async () => {
          const booking = await db.selectFrom('bookings').select('id').where('salon_id', '=', salon.salonId).executeTakeFirstOrThrow();
          await db
            .insertInto('payments')
            .values({
              salon_id: salon.salonId,
              booking_id: booking.id,
              client_id: null,
              method: 'cash',
              amount_cents: 1000,
              currency: 'USD',
              status: 'succeeded',
              provider_ref: null,
            })
            .execute();
        },
      ],
      [
        'steps alone',
        () =>
          sql`update booking_steps set label = label || '' where sitting_id in (select s.id from sittings s join bookings b on b.id = s.booking_id where b.salon_id = ${salon.salonId})`.execute(
            db,
          ),
      ],
    ];
    const otherBefore = await version(elsewhere.salonId);
    for (const [what, change] of changes) {
      const before = await version();
      await change();
      expect(await version(), what).toBeGreaterThan(before);
    }
    expect(await version(elsewhere.salonId)).toBe(otherBefore);
  });
});

describe('cached reads on two app servers', () => {
  it("a booking made through one server is in the other server's desk day at once; an unchanged day answers 304 to its entity tag", async () => {
    const deskA = await signedInAgent(t.app, desk.email, desk.password);
    const deskB = await signedInAgent(other, desk.email, desk.password);
    const wednesday = futureWeekday(3, 4);
    const first = await deskA.get(`/api/desk/day?date=${wednesday}`);
    expect(first.status).toBe(200);
    expect(first.body.bookings).toHaveLength(0);
    const etag = first.headers.etag as string;
    expect(etag).toMatch(/^W\/"/);
    expect((await deskA.get(`/api/desk/day?date=${wednesday}`).set('If-None-Match', etag)).status).toBe(304);

    const made = await book(deskB, `${wednesday}T10:00:00-07:00`);
    expect(made.status).toBe(201);
    const after = await deskA.get(`/api/desk/day?date=${wednesday}`).set('If-None-Match', etag);
    expect(after.status).toBe(200);
    expect(after.headers.etag).not.toBe(etag);
    expect(after.body.bookings.map((b: { id: string }) => b.id)).toEqual([made.body.id]);
    const week = await deskA.get(`/api/desk/week?date=${wednesday}`);
    expect(week.body.bookings.map((b: { id: string }) => b.id)).toContain(made.body.id);

    // Cancelled through server A: server B's cached week no longer shows it.
    await deskB.get(`/api/desk/week?date=${wednesday}`);
    expect((await deskA.write('post', `/api/bookings/${made.body.id}/cancel`, { reason: 'Client asked' })).status).toBe(200);
    const weekB = await deskB.get(`/api/desk/week?date=${wednesday}`);
    expect(weekB.body.bookings.map((b: { id: string }) => b.id)).not.toContain(made.body.id);
  });

  it("a booking on one date keeps the cached answers of other dates, and moving a second sitting renews the first sitting's date", async () => {
    const desk$ = await signedInAgent(t.app, desk.email, desk.password);
    const day = (date: string) => desk$.get(`/api/desk/day?date=${date}`);
    const [x, y] = [futureWeekday(5, 5), futureWeekday(6, 5)];
    const [xTag, yTag] = [(await day(x)).headers.etag!, (await day(y)).headers.etag!];
    expect((await book(desk$, `${x}T10:00:00-07:00`)).status).toBe(201);
    expect((await day(y).set('If-None-Match', yTag)).status).toBe(304);
    expect((await day(x).set('If-None-Match', xTag)).status).toBe(200);

    const asked = await desk$.write('post', '/api/booking-options', {
      clientId: client.clientId,
      serviceId: correction,
      stepPlan: correctionPlan,
      stylistId: ana.staffId,
      earliestDate: futureWeekday(3, 2),
    });
    expect(asked.status, JSON.stringify(asked.body)).toBe(200);
    const option = asked.body.options[0];
    const made = await book(desk$, option.sittings[0].start, correction, correctionPlan);
    expect(made.status).toBe(201);
    const first = option.sittings[0].start.slice(0, 10);
    const seen = await day(first);
    const second = made.body.sittings[1];
    const later = new Date(Date.parse(second.start) + 86_400_000).toISOString();
    const moved = await desk$.write('post', `/api/bookings/${made.body.id}/move`, { sitting: 2, start: later });
    expect(moved.status, JSON.stringify(moved.body)).toBe(200);
    const again = await day(first).set('If-None-Match', seen.headers.etag!);
    expect(again.status).toBe(200);
    const shown = again.body.bookings.find((b: { id: string }) => b.id === made.body.id);
    expect(Date.parse(shown.sittings[1].start)).toBe(Date.parse(later));
  });

  it("a time booked through one server leaves the other server's public free times at once", async () => {
    const thursday = futureWeekday(4, 4);
    const visitor = await anonymousAgent(t.app);
    const url = `/api/public/salons/${slug}/availability?serviceId=${toner}&stylistId=${ana.staffId}&from=${thursday}`;
    const before = (await visitor.get(url)).body.times as { start: string }[];
    expect(before.length).toBeGreaterThan(0);
    expect((await visitor.get(url)).body.times).toEqual(before); // answered from the cache, the same
    const deskB = await signedInAgent(other, desk.email, desk.password);
    expect((await book(deskB, before[0]!.start)).status).toBe(201);
    const after = (await visitor.get(url)).body.times as { start: string }[];
    expect(after.map((s) => s.start)).not.toContain(before[0]!.start);
    // Nothing about the salon's clients is cached into the public answer.
    expect(JSON.stringify(after)).not.toContain(client.clientId!);
  });

  it('keeps each salon and each stylist to its own answers', async () => {
    const db = t.testDb.db;
    const second = await insertSalon(db);
    const secondDesk = await insertUser(db, second.salonId, 'front_desk');
    const deskHere = await signedInAgent(t.app, desk.email, desk.password);
    const deskThere = await signedInAgent(t.app, secondDesk.email, secondDesk.password);
    const date = futureWeekday(3, 4);
    const here = await deskHere.get(`/api/desk/day?date=${date}`);
    const there = await deskThere.get(`/api/desk/day?date=${date}`);
    expect(there.body.stylists).toEqual([]);
    expect(there.headers.etag).not.toBe(here.headers.etag);
    const bea = await insertUser(db, salon.salonId, 'stylist', { skills: ['colour'] });
    const ana$ = await signedInAgent(t.app, ana.email, ana.password);
    const bea$ = await signedInAgent(t.app, bea.email, bea.password);
    const anaDay = await ana$.get(`/api/stylist/day?date=${date}`);
    const beaDay = await bea$.get(`/api/stylist/day?date=${date}`);
    expect(anaDay.body.stylists.map((s: { id: string }) => s.id)).toEqual([ana.staffId]);
    expect(beaDay.body.stylists.map((s: { id: string }) => s.id)).toEqual([bea.staffId]);
  });
});
