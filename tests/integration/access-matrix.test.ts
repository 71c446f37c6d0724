import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { upload } from '../setup/upload-agent';
import { insertSalon } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertService, insertTestBooking } from '../factories/booking';
import { makeImage } from '../factories/image';
import type { Role } from '@shared/schemas/common.schemas';
import { documentedRoutes, fillPath, type DocumentedRoute } from './access-matrix/openapi-routes';
import { expectedAccess, type Expectation } from './access-matrix/expected-access';
import { answersEventStream, headOfStream } from '../setup/event-stream';

// Every route of the OpenAPI document × every kind of caller, over HTTP. The expectations live in
// access-matrix/expected-access.ts (one line per route); see DEVELOPERS.md for adding a route.

type Who = 'anonymous' | 'client' | 'otherClient' | 'stylist' | 'front_desk' | 'owner' | 'otherSalon';
// Refused callers first, so a write that an allowed caller performs (a cancel, a delete) cannot hide a refusal.
const CALLERS: Who[] = ['anonymous', 'otherClient', 'otherSalon', 'client', 'stylist', 'front_desk', 'owner'];
const roleOf = (who: Exclude<Who, 'anonymous'>): Role => (who === 'otherClient' ? 'client' : who === 'otherSalon' ? 'owner' : who);

type Outcome = 'allowed' | 'unauthenticated' | 'forbidden' | 'hidden';

function expectedOutcome(e: Expectation, who: Who): Outcome {
  if (e.allow === 'anyone') return 'allowed';
  if (who === 'anonymous') return 'unauthenticated';
  if (e.allow !== 'signed_in' && !e.allow.includes(roleOf(who))) return 'forbidden';
  if (e.own && (who === 'otherClient' || who === 'otherSalon')) return 'hidden';
  return 'allowed';
}

let t: TestApp;
let routes: DocumentedRoute[];
const agents = {} as Record<Who, Awaited<ReturnType<typeof anonymousAgent>>>;
/** Client A's records: the ids routes are called with, and what must never reach another caller. */
const mine = {} as { clientId: string; bookingId: string; holdId: string; photoId: string; standbyId: string; skinTestId: string; slug: string; email: string };

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  const salon = await insertSalon(db);
  const users = {} as Record<Exclude<Who, 'anonymous'>, UserFixture>;
  for (const role of ['client', 'stylist', 'front_desk', 'owner'] as const) users[role] = await insertUser(db, salon.salonId, role);
  users.otherClient = await insertUser(db, salon.salonId, 'client');
  const elsewhere = await insertSalon(db);
  users.otherSalon = await insertUser(db, elsewhere.salonId, 'owner');
  // The other salon has its own client and booking, so its owner's lists are not trivially empty.
  const theirClient = await insertUser(db, elsewhere.salonId, 'client');
  const theirStylist = await insertUser(db, elsewhere.salonId, 'stylist');
  await insertTestBooking(db, {
    salonId: elsewhere.salonId,
    clientId: theirClient.clientId!,
    stylistId: theirStylist.staffId!,
    chairId: elsewhere.chairs[0]!,
    serviceId: await insertService(db, elsewhere.salonId),
    steps: [['hands_on', '2027-03-02T17:00:00Z', '2027-03-02T17:30:00Z']],
  });

  const serviceId = await insertService(db, salon.salonId);
  mine.clientId = users.client.clientId!;
  mine.email = users.client.email;
  mine.bookingId = await insertTestBooking(db, {
    salonId: salon.salonId,
    clientId: mine.clientId,
    stylistId: users.stylist.staffId!,
    chairId: salon.chairs[0]!,
    serviceId,
    steps: [['hands_on', '2027-03-02T17:00:00Z', '2027-03-02T17:30:00Z']],
  });
  // Client A's unpaid online hold (claimed, kept for a day here so it stays open through the walk): the {id} of /api/me/holds/….
  mine.holdId = await insertTestBooking(db, {
    salonId: salon.salonId,
    clientId: mine.clientId,
    stylistId: users.stylist.staffId!,
    chairId: salon.chairs[0]!,
    serviceId,
    steps: [['hands_on', '2027-03-03T17:00:00Z', '2027-03-03T17:30:00Z']],
  });
  await db
    .updateTable('bookings')
    .set({ status: 'held', held_until: new Date(Date.now() + 86_400_000), hold_secret_hash: 'not-a-real-hash' })
    .where('id', '=', mine.holdId)
    .execute();
  const standby = await db
    .insertInto('standby_entries')
    .values({
      salon_id: salon.salonId,
      client_id: mine.clientId,
      service_ids: [serviceId],
      stylist_id: null,
      availability: JSON.stringify([{ weekdays: [2], from: '09:00', to: '12:00' }]),
      created_by: users.owner.id,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  mine.standbyId = standby.id;
  // A skin test of client A applied and not read yet: the {testId} of the reading route.
  const skinTest = await db
    .insertInto('skin_tests')
    .values({
      salon_id: salon.salonId,
      client_id: mine.clientId,
      applied_at: new Date(Date.now() - 49 * 3_600_000),
      read_at: null,
      result: 'pending',
      recorded_by: users.stylist.id,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  mine.skinTestId = skinTest.id;
  mine.slug = (await db.selectFrom('salons').select('slug').where('id', '=', salon.salonId).executeTakeFirstOrThrow()).slug;

  agents.anonymous = await anonymousAgent(t.app);
  for (const who of CALLERS.filter((w) => w !== 'anonymous') as Exclude<Who, 'anonymous'>[]) {
    agents[who] = await signedInAgent(t.app, users[who].email, users[who].password);
  }
  const uploaded = await upload(agents.client.agent, '/api/me/photos', [{ name: 'now.jpg', bytes: await makeImage('jpeg') }]);
  mine.photoId = uploaded.body.photos[0].id;
  await agents.client.refreshCsrf();

  // Reads first, then writes, then deletes; signing out last, since it ends each caller's session.
  const rank = (r: DocumentedRoute) => (r.key === 'DELETE /api/session' ? 3 : r.method === 'get' ? 0 : r.method === 'delete' ? 2 : 1);
  routes = (await documentedRoutes(t.app)).routes.sort((a, b) => rank(a) - rank(b));
});
afterAll(() => t.close());

/** Path ids: the record the segment before `{id}` names, always client A's (or salon A's slug). */
function pathFor(route: DocumentedRoute): string {
  const id = /\/(bookings|clients|holds|photos|standby)\/\{id\}/.exec(route.path)?.[1];
  const byKind: Record<string, string> = {
    bookings: mine.bookingId,
    clients: mine.clientId,
    holds: mine.holdId,
    photos: mine.photoId,
    standby: mine.standbyId,
  };
  return fillPath(route.path, { ...(id ? { id: byKind[id] } : {}), slug: mine.slug, testId: mine.skinTestId });
}

async function send(who: Who, route: DocumentedRoute, query = '') {
  // A live event stream stays open: it is read up to its opening, which is all a caller is answered at first.
  if (route.method === 'get') {
    const test = agents[who].get(pathFor(route) + query);
    return answersEventStream(route.operation) ? headOfStream(test) : test;
  }
  // GET /api/csrf (one of the routes walked) replaces the token, so each write fetches a fresh one as a page would.
  await agents[who].refreshCsrf();
  return agents[who].write(route.method, pathFor(route) + query, {});
}

// The leak checks run first: the matrix below cancels, deletes and finally signs everybody out.
describe("nobody else reads client A's records, by id guessing or by filters", () => {
  it('no answer to another client or another salon contains them, whatever the query asks for', async () => {
    const secrets = [mine.clientId, mine.bookingId, mine.photoId, mine.standbyId, mine.email];
    const filters = `?clientId=${mine.clientId}&bookingId=${mine.bookingId}&client_id=${mine.clientId}&q=${encodeURIComponent(mine.email)}`;
    const leaks: string[] = [];
    let answered = 0;
    for (const route of routes.filter((r) => r.method === 'get')) {
      for (const who of ['otherClient', 'otherSalon'] as const) {
        for (const query of ['', filters]) {
          const res = await send(who, route, query);
          if (res.status >= 300) continue;
          answered++;
          const text = JSON.stringify(res.body) + (res.text ?? '');
          // Ids that merely echo the request path (a 404 would not get here) are not leaks; bodies are.
          const found = secrets.filter((s) => text.includes(s));
          if (found.length) leaks.push(`${route.key}${query ? ' (filtered)' : ''} as ${who}: ${found.join(', ')}`);
        }
      }
    }
    expect(leaks).toEqual([]);
    expect(answered).toBeGreaterThan(10); // the callers really were signed in and got answers
  }, 120_000);

  it("staff of the other salon find nothing of this salon's in their own lists", async () => {
    const res = await agents.otherSalon.get(`/api/clients?q=${encodeURIComponent(mine.email)}`);
    expect(res.status).toBe(200);
    expect(res.body.clients).toEqual([]);
    const all = await agents.otherSalon.get('/api/clients');
    expect(all.body.clients.length).toBeGreaterThan(0); // their own client is listed
    expect(JSON.stringify(all.body)).not.toContain(mine.clientId);
  });
});

describe('access matrix from the OpenAPI document', () => {
  it('has an expectation for every documented route, and none for a route that is gone', () => {
    const documented = routes.map((r) => r.key);
    expect(
      documented.filter((k) => !(k in expectedAccess)),
      'add these to tests/integration/access-matrix/expected-access.ts',
    ).toEqual([]);
    expect(Object.keys(expectedAccess).filter((k) => !documented.includes(k))).toEqual([]);
  });

  it('answers every route × caller as expected', async () => {
    const wrong: string[] = [];
    for (const route of routes) {
      const expectation = expectedAccess[route.key];
      if (!expectation) continue;
      for (const who of CALLERS) {
        const outcome = expectedOutcome(expectation, who);
        const res = await send(who, route);
        const code = res.body?.error?.code;
        const ok =
          outcome === 'unauthenticated'
            ? res.status === 401 && code === 'UNAUTHENTICATED'
            : outcome === 'forbidden'
              ? res.status === 403 && code === 'FORBIDDEN'
              : outcome === 'hidden'
                ? route.method === 'get'
                  ? res.status === 404
                  : res.status >= 400 && res.status < 500
                : res.status < 500 && res.status !== 401 && res.status !== 403 && !(expectation.own && route.method === 'get' && res.status === 404);
        if (!ok) wrong.push(`${route.key} as ${who}: expected ${outcome}, got ${res.status} ${code ?? ''}`);
      }
    }
    expect(wrong).toEqual([]);
  }, 180_000); // ~500 requests; a busy CI machine needs more than the suite's default 20 s
});
