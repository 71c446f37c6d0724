import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertService, insertTestBooking } from '../factories/booking';
import type { Role } from '@shared/schemas/common.schemas';

let t: TestApp;
let salon: SalonFixture;
const users = {} as Record<Role | 'otherClient' | 'otherSalonOwner', UserFixture>;
let clientBooking: string;
let otherClientBooking: string;

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db);
  for (const role of ['client', 'front_desk', 'stylist', 'owner'] as const) users[role] = await insertUser(db, salon.salonId, role);
  users.otherClient = await insertUser(db, salon.salonId, 'client');
  const elsewhere = await insertSalon(db);
  users.otherSalonOwner = await insertUser(db, elsewhere.salonId, 'owner');
  const serviceId = await insertService(db, salon.salonId);
  const book = (clientId: string, chairId: string) =>
    insertTestBooking(db, {
      salonId: salon.salonId,
      clientId,
      stylistId: users.stylist.staffId!,
      chairId,
      serviceId,
      steps: [['hands_on', '2027-03-02T17:00:00Z', '2027-03-02T17:30:00Z']],
    });
  clientBooking = await book(users.client.clientId!, salon.chairs[0]!);
  otherClientBooking = await insertTestBooking(db, {
    salonId: salon.salonId,
    clientId: users.otherClient.clientId!,
    stylistId: users.stylist.staffId!,
    chairId: salon.chairs[1]!,
    serviceId,
    steps: [['developing', '2027-03-02T17:00:00Z', '2027-03-02T17:30:00Z']],
  });
});
afterAll(() => t.close());

// role → route → expected status; 200 allowed, 401 signed out, 403 wrong role.
const matrix: [string, Partial<Record<Role | 'anonymous', number>>][] = [
  ['/api/desk/day?date=2027-03-02', { anonymous: 401, client: 403, stylist: 403, front_desk: 200, owner: 200 }],
  ['/api/stylist/day?date=2027-03-02', { anonymous: 401, client: 403, stylist: 200, front_desk: 403, owner: 403 }],
  ['/api/me/bookings', { anonymous: 401, client: 200, stylist: 403, front_desk: 403, owner: 403 }],
  ['/api/owner/overview', { anonymous: 401, client: 403, stylist: 403, front_desk: 403, owner: 200 }],
  ['/api/clients', { anonymous: 401, client: 403, stylist: 200, front_desk: 200, owner: 200 }],
  ['/api/salon', { anonymous: 401, client: 200, stylist: 200, front_desk: 200, owner: 200 }],
  ['/api/dev/mailbox', { anonymous: 401, client: 403, stylist: 403, front_desk: 200, owner: 200 }],
];

describe('role checks on every sampled route', () => {
  for (const [path, expected] of matrix) {
    for (const [who, status] of Object.entries(expected)) {
      it(`GET ${path} as ${who} → ${status}`, async () => {
        const c = who === 'anonymous' ? await anonymousAgent(t.app) : await signedInAgent(t.app, users[who as Role].email, users[who as Role].password);
        const res = await c.get(path);
        expect(res.status).toBe(status);
        if (status !== 200) expect(res.body.error.code).toBe(status === 401 ? 'UNAUTHENTICATED' : 'FORBIDDEN');
      });
    }
  }
});

describe('a client sees only their own records', () => {
  it('lists only their own bookings', async () => {
    const c = await signedInAgent(t.app, users.client.email, users.client.password);
    const res = await c.get('/api/me/bookings');
    expect(res.body.bookings.map((b: { id: string }) => b.id)).toEqual([clientBooking]);
  });

  it("answers another client's booking exactly like a missing one (404)", async () => {
    const c = await signedInAgent(t.app, users.client.email, users.client.password);
    expect((await c.get(`/api/bookings/${clientBooking}`)).status).toBe(200);
    const other = await c.get(`/api/bookings/${otherClientBooking}`);
    const missing = await c.get('/api/bookings/7d0f3a52-5b36-4c1b-9a55-2f0e3e1d9c11');
    expect(other.status).toBe(404);
    // Every error body carries its own request's id; apart from that the two answers are the same.
    const withoutRequestId = (body: { error: Record<string, unknown> }) => ({ ...body, error: { ...body.error, requestId: undefined } });
    expect(withoutRequestId(other.body)).toEqual(withoutRequestId(missing.body));
    expect(other.body.error.requestId).not.toEqual(missing.body.error.requestId);
  });

  it("cannot open another client's card", async () => {
    const c = await signedInAgent(t.app, users.client.email, users.client.password);
    expect((await c.get(`/api/clients/${users.otherClient.clientId}`)).status).toBe(403);
  });
});

describe('staff of one salon never see another salon', () => {
  it("another salon's owner gets 404 for this salon's booking and client, and an empty search", async () => {
    const c = await signedInAgent(t.app, users.otherSalonOwner.email, users.otherSalonOwner.password);
    expect((await c.get(`/api/bookings/${clientBooking}`)).status).toBe(404);
    expect((await c.get(`/api/clients/${users.client.clientId}`)).status).toBe(404);
    expect((await c.get('/api/clients?q=Client')).body.clients).toEqual([]);
  });
});
