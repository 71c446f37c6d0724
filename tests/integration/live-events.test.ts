// Live updates (GET /api/events): the book-version triggers NOTIFY PostgreSQL, every app server LISTENs, and each
// tells its own open streams of that salon. Two app servers (two createApp instances with their own hubs) share
// one database here, listening on real ports, as docs/scaling.md describes.
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '@server/app';
import { anotherApp, startTestApp, signedInAgent, anonymousAgent, type TestApp } from '../setup/test-app';
import { headOfStream, openStream, type OpenStream } from '../setup/event-stream';
import { futureWeekday, localIso } from '../setup/dates';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertPlannedService } from '../factories/service';
import { sendJson, signIn } from '../bench/load/http-session';

type App = ReturnType<typeof createApp>;
let t: TestApp;
let b: App;
const servers: Server[] = [];
const urls: string[] = [];
let salon: SalonFixture;
let desk: UserFixture;
let ana: UserFixture;
let client: UserFixture;
let otherOwner: UserFixture;
let toner: string;
const opened: OpenStream[] = [];

const TONER = { sittings: [{ steps: [{ kind: 'hands_on' as const, label: 'Apply toner', product: 'toner_direct' as const, minutes: 30 }] }] };

const secondApp = (env: Record<string, string> = {}): App => anotherApp(t, env);

async function serve(app: App): Promise<string> {
  const server = app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  servers.push(server);
  return `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
}

async function streamAs(url: string, user: UserFixture): Promise<OpenStream> {
  const session = await signIn(url, user.email, user.password);
  const stream = await openStream(`${url}/api/events`, session.cookie);
  opened.push(stream);
  return stream;
}

const until = async (check: () => boolean, ms = 3_000) => {
  for (const end = Date.now() + ms; !check();) {
    if (Date.now() > end) throw new Error('not in time');
    await new Promise((r) => setTimeout(r, 20));
  }
};

beforeAll(async () => {
  t = await startTestApp();
  b = secondApp();
  urls.push(await serve(t.app), await serve(b));
  const db = t.testDb.db;
  salon = await insertSalon(db, { chairs: 2, basins: 1 });
  desk = await insertUser(db, salon.salonId, 'front_desk');
  ana = await insertUser(db, salon.salonId, 'stylist', { skills: ['colour'] });
  client = await insertUser(db, salon.salonId, 'client');
  toner = await insertPlannedService(db, salon.salonId, { name: 'Toner refresh', plan: TONER });
  otherOwner = await insertUser(db, (await insertSalon(db)).salonId, 'owner');
});
afterAll(async () => {
  for (const stream of opened) stream.close();
  await b?.shutdown();
  for (const server of servers) {
    server.closeAllConnections();
    await new Promise((r) => server.close(r));
  }
  await t.close();
});

describe('live events across app servers', () => {
  it("tells a stream on server B of a booking made, moved and cancelled through server A, naming its dates; another salon's stream hears nothing", async () => {
    const a = urls[0]!;
    const bUrl = urls[1]!;
    const stylistOnB = await streamAs(bUrl, ana);
    const deskOnB = await streamAs(bUrl, desk);
    const elsewhere = await streamAs(bUrl, otherOwner);
    expect([stylistOnB.status, deskOnB.status, elsewhere.status]).toEqual([200, 200, 200]);
    const session = await signIn(a, desk.email, desk.password);
    const [day, later] = [futureWeekday(3, 3), futureWeekday(4, 3)];

    const made = await sendJson(a, session, 'POST', '/api/bookings', {
      clientId: client.clientId,
      serviceId: toner,
      stepPlan: TONER,
      stylistId: ana.staffId,
      start: localIso(day, '10:00'),
      idempotencyKey: crypto.randomUUID(),
    });
    expect(made.status).toBe(201);
    const id = made.body.id as string;
    for (const stream of [stylistOnB, deskOnB]) {
      const event = JSON.parse((await stream.next('book', 3_000)).data);
      // Dates and booking ids only: nothing personal travels on the stream.
      expect(event).toEqual({ dates: [day], everyDate: false, bookingIds: [id] });
    }

    const moved = await sendJson(a, session, 'POST', `/api/bookings/${id}/move`, { sitting: 1, start: localIso(later, '11:00') });
    expect(moved.status).toBe(200);
    // One event for the move's transaction, naming the date it left and the date it went to.
    expect(JSON.parse((await deskOnB.next('book', 3_000)).data)).toEqual({ dates: [day, later], everyDate: false, bookingIds: [id] });

    const cancelled = await sendJson(a, session, 'POST', `/api/bookings/${id}/cancel`, { reason: 'Client asked' });
    expect(cancelled.status).toBe(200);
    expect(JSON.parse((await deskOnB.next('book', 3_000)).data)).toMatchObject({ dates: [later], bookingIds: [id] });

    // A step changed straight in the database (as the day's running will change its times) is told too.
    await sql`update booking_steps set label = label || '' where sitting_id in (select id from sittings where booking_id = ${id})`.execute(t.testDb.db);
    expect(JSON.parse((await deskOnB.next('book', 3_000)).data)).toEqual({ dates: [later], everyDate: false, bookingIds: [id] });

    await new Promise((r) => setTimeout(r, 300)); // anything misdirected would have arrived by now
    expect(elsewhere.events.filter((e) => e.event === 'book')).toEqual([]);
  });

  it('tells of a change that reaches every date (a stylist renamed) as everyDate', async () => {
    const stream = await streamAs(urls[1]!, desk);
    await t.testDb.db.updateTable('staff').set({ display_name: 'Ana R.' }).where('id', '=', ana.staffId!).execute();
    expect(JSON.parse((await stream.next('book', 3_000)).data)).toEqual({ dates: [], everyDate: true, bookingIds: [] });
  });

  it('refuses clients (403) and signed-out callers (401), and opens with the retry hint for staff', async () => {
    const asClient = await headOfStream((await signedInAgent(t.app, client.email, client.password)).get('/api/events'));
    expect(asClient.status).toBe(403);
    expect(asClient.body.error.code).toBe('FORBIDDEN');
    const anonymous = await headOfStream((await anonymousAgent(t.app)).get('/api/events'));
    expect(anonymous.status).toBe(401);
    expect(anonymous.body.error.code).toBe('UNAUTHENTICATED');
    const staff = await headOfStream((await signedInAgent(t.app, desk.email, desk.password)).get('/api/events'));
    expect(staff.status).toBe(200);
    expect(staff.headers['content-type']).toMatch(/^text\/event-stream/);
    expect(staff.headers['cache-control']).toBe('no-store');
    expect(staff.body).toMatch(/^retry: \d+\n/);
  });

  it('lets go of a stream the screen closed, and of its LISTEN connection when the last one went', async () => {
    const before = b.liveStreams();
    const stream = await streamAs(urls[1]!, desk);
    expect(b.liveStreams()).toBe(before + 1);
    stream.close();
    await until(() => b.liveStreams() === before);
  });

  it('holds at most LIVE_STREAMS_MAX streams per server, answering 503 BUSY beyond', async () => {
    const small = secondApp({ LIVE_STREAMS_MAX: '1' });
    const url = await serve(small);
    try {
      const first = await streamAs(url, desk);
      expect(first.status).toBe(200);
      const session = await signIn(url, desk.email, desk.password);
      const refused = await fetch(`${url}/api/events`, { headers: { cookie: session.cookie } });
      expect(refused.status).toBe(503);
      expect(((await refused.json()) as { error: { code: string } }).error.code).toBe('BUSY');
      first.close();
    } finally {
      await small.shutdown();
    }
  });
});
