import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertPlannedService, tonerPlan } from '../factories/service';
import { futureWeekday, localIso } from '../setup/dates';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';

let t: TestApp;
let salon: SalonFixture;
let ana: UserFixture;
let toner: string;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;
let ana$: Awaited<ReturnType<typeof signedInAgent>>;
const friday = futureWeekday(5, 2);
const clients: { id: string; name: string }[] = [];

// A vivid colour visit: 10:00–10:45 hands-on, 10:45–11:35 developing (Ana's hands are free), then rinse. Direct dye,
// so no processing limit applies (45 min of lightener and 50 of lifting would be over the salon's 50 min limit).
const lightening: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'hands_on', label: 'Apply vivid colour', product: 'direct_dye', minutes: 45 },
        { kind: 'developing', label: 'Vivid colour develops', product: 'direct_dye', minMinutes: 50, maxMinutes: 50 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 15 },
      ],
    },
  ],
};

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db, { chairs: 3, basins: 2 });
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  ana = await insertUser(db, salon.salonId, 'stylist', { maxClientsAtOnce: 2 });
  toner = await insertPlannedService(db, salon.salonId, { plan: tonerPlan, name: 'Toner refresh' });
  const lighteningId = await insertPlannedService(db, salon.salonId, { plan: lightening, name: 'Vivid colour' });
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
  ana$ = await signedInAgent(t.app, ana.email, ana.password);
  for (const name of ['Ines Vale', 'Otto Brandt', 'Pia Sol']) {
    const res = await desk$.write('post', '/api/clients', {
      name,
      phone: '+1 970 555 01' + String(clients.length + 10),
      email: `${name.split(' ')[0]!.toLowerCase()}@example.test`,
    });
    expect(res.status).toBe(201);
    clients.push(res.body);
  }
  const booked = await desk$.write('post', '/api/bookings', {
    clientId: clients[2]!.id,
    serviceId: lighteningId,
    stepPlan: lightening,
    stylistId: ana.staffId,
    start: localIso(friday, '10:00'),
    idempotencyKey: 'window-base-0001',
  });
  expect(booked.status).toBe(201);
});
afterAll(() => t.close());

const availability = [{ weekdays: [2, 3, 4, 5, 6], from: '09:00', to: '17:00' }];

describe('standby list', () => {
  it('adds, lists and removes entries; refuses ids of another salon and bad time ranges', async () => {
    const added = await desk$.write('post', '/api/standby', {
      clientId: clients[0]!.id,
      serviceIds: [toner],
      stylistId: null,
      availability,
      notes: 'Can come at short notice',
    });
    expect(added.status).toBe(201);
    expect(added.body).toMatchObject({ client: { name: 'Ines Vale' }, services: [{ name: 'Toner refresh' }] });
    const other = await desk$.write('post', '/api/standby', {
      clientId: '7d0f3a52-5b36-4c1b-9a55-2f0e3e1d9c11',
      serviceIds: [toner],
      stylistId: null,
      availability,
    });
    expect(other.status).toBe(400);
    expect(other.body.error.fields.clientId).toBeDefined();
    const backwards = await desk$.write('post', '/api/standby', {
      clientId: clients[1]!.id,
      serviceIds: [toner],
      stylistId: null,
      availability: [{ weekdays: [2], from: '15:00', to: '09:00' }],
    });
    expect(backwards.body.error.fields['availability.0.to']).toBeDefined();
    const second = await desk$.write('post', '/api/standby', { clientId: clients[1]!.id, serviceIds: [toner], stylistId: ana.staffId, availability });
    expect((await desk$.get('/api/standby')).body.entries).toHaveLength(2);
    expect(second.status).toBe(201);
  });
});

describe('hands-free windows', () => {
  it("lists the stylist's window during the developing step with the fit and the standby clients who want it", async () => {
    const res = await ana$.get(`/api/windows?date=${friday}`);
    expect(res.status).toBe(200);
    const window = res.body.windows.find((w: { start: string }) => w.start === localIso(friday, '10:45'));
    expect(window).toMatchObject({ end: localIso(friday, '11:35'), minutes: 50 });
    expect(window.fits.map((f: { name: string }) => f.name)).toEqual(['Toner refresh']);
    expect(window.standby.map((s: { clientName: string }) => s.clientName).sort()).toEqual(['Ines Vale', 'Otto Brandt']);
  });

  it('offers the window to two standby clients: both get an SMS; the first to accept wins, the second is told it has gone', async () => {
    const entries = (await desk$.get('/api/standby')).body.entries as { id: string; client: { id: string; name: string; phone: string } }[];
    const offered = await ana$.write('post', '/api/windows/offer', {
      stylistId: ana.staffId,
      serviceId: toner,
      start: localIso(friday, '10:50'),
      standbyEntryIds: entries.map((e) => e.id),
    });
    expect(offered.status).toBe(201);
    expect(offered.body.offers).toBe(2);
    const links = entries.map((e) => {
      const sms = t.sms.messages.find((m) => m.to === e.client.phone && m.body.includes('/offer/'));
      expect(sms, `SMS to ${e.client.name}`).toBeDefined();
      return /\/offer\/([A-Za-z0-9_-]+)/.exec(sms!.body)![1];
    });
    const visitor = await anonymousAgent(t.app);
    expect((await visitor.get(`/api/offers/${links[0]}`)).body).toMatchObject({ status: 'offered', serviceName: 'Toner refresh' });
    const answers = await Promise.all(links.map((token) => visitor.write('post', `/api/offers/${token}/accept`)));
    const a = answers[0]!;
    const b = answers[1]!;
    const statuses = [a.status, b.status].sort();
    expect(statuses).toEqual([200, 409]);
    const loser = a.status === 409 ? entries[0]! : entries[1]!;
    expect(t.sms.messages.some((m) => m.to === loser.client.phone && m.body.includes('has been taken'))).toBe(true);
    // Offer, taken and gone are all in the send log, once each per channel.
    const winner = loser === entries[0] ? entries[1]! : entries[0]!;
    const logged = await t.testDb.db
      .selectFrom('messages')
      .select(['kind', 'client_id', 'status'])
      .where('kind', 'like', 'window_offer%')
      .where('channel', '=', 'sms')
      .execute();
    expect(
      logged
        .filter((r) => r.client_id === winner.client.id)
        .map((r) => `${r.kind} ${r.status}`)
        .sort(),
    ).toEqual(['window_offer sent', 'window_offer_taken sent']);
    expect(
      logged
        .filter((r) => r.client_id === loser.client.id)
        .map((r) => `${r.kind} ${r.status}`)
        .sort(),
    ).toEqual(['window_offer sent', 'window_offer_gone sent']);
    const after = (await ana$.get(`/api/windows?date=${friday}`)).body.windows;
    // The toner now sits in the window: only the 5 minutes before it are still hands-free from 10:45.
    expect(after.find((w: { start: string }) => w.start === localIso(friday, '10:45')).end).toBe(localIso(friday, '10:50'));
  });

  it("a stylist fills a window with a walk-in; a stylist cannot fill another stylist's window", async () => {
    // Applying at 11:30 would run into the lightening rinse at 11:35 (Ana's hands); 11:55 is clear.
    const clash = await ana$.write('post', '/api/windows/fill', {
      stylistId: ana.staffId,
      serviceId: toner,
      start: localIso(friday, '11:30'),
      walkIn: { name: 'Walk-in Wes' },
      idempotencyKey: 'fill-key-0001',
    });
    expect(clash.status).toBe(409);
    const res = await ana$.write('post', '/api/windows/fill', {
      stylistId: ana.staffId,
      serviceId: toner,
      start: localIso(friday, '11:55'),
      walkIn: { name: 'Walk-in Wes' },
      idempotencyKey: 'fill-key-0003',
    });
    expect(res.status).toBe(201);
    expect(res.body.client.name).toBe('Walk-in Wes');
    // With a latest start, the same 11:30 request goes in at the earliest free start up to 13:00 instead.
    const flexible = await ana$.write('post', '/api/windows/fill', {
      stylistId: ana.staffId,
      serviceId: toner,
      start: localIso(friday, '11:30'),
      latestStart: localIso(friday, '13:00'),
      walkIn: { name: 'Walk-in Vi' },
      idempotencyKey: 'fill-key-0004',
    });
    expect(flexible.status).toBe(201);
    const at = Date.parse(flexible.body.sittings[0].start);
    expect(at).toBeGreaterThan(Date.parse(localIso(friday, '11:30')));
    expect(at).toBeLessThanOrEqual(Date.parse(localIso(friday, '13:00')));
    const marcus = await insertUser(t.testDb.db, salon.salonId, 'stylist');
    const other = await ana$.write('post', '/api/windows/fill', {
      stylistId: marcus.staffId,
      serviceId: toner,
      start: localIso(friday, '14:00'),
      walkIn: { name: 'Walk-in Wes' },
      idempotencyKey: 'fill-key-0002',
    });
    expect(other.status).toBe(403);
  });

  it('filling a window withdraws its open offers at once: the link says the time has gone, and the window card shows it', async () => {
    const thursday = futureWeekday(4, 2);
    const lighteningId = (
      await t.testDb.db.selectFrom('services').select('id').where('name', '=', 'Vivid colour').where('salon_id', '=', salon.salonId).executeTakeFirstOrThrow()
    ).id;
    const base = await desk$.write('post', '/api/bookings', {
      clientId: clients[2]!.id,
      serviceId: lighteningId,
      stepPlan: lightening,
      stylistId: ana.staffId,
      start: localIso(thursday, '10:00'),
      idempotencyKey: 'window-base-0002',
    });
    expect(base.status).toBe(201);
    const open = (await desk$.get('/api/standby')).body.entries as { id: string; client: { id: string; name: string; phone: string } }[];
    expect(open.length).toBeGreaterThan(0);
    const offered = await desk$.write('post', '/api/windows/offer', {
      stylistId: ana.staffId,
      serviceId: toner,
      start: localIso(thursday, '10:50'),
      standbyEntryIds: [open[0]!.id],
    });
    expect(offered.status).toBe(201);
    const sms = t.sms.messages.filter((m) => m.to === open[0]!.client.phone && m.body.includes('/offer/')).at(-1)!;
    const token = /\/offer\/([A-Za-z0-9_-]+)/.exec(sms.body)![1];
    const card = (await desk$.get(`/api/windows?date=${thursday}`)).body;
    expect(card.windows.find((w: { start: string }) => w.start === localIso(thursday, '10:45')).offers).toMatchObject([
      { clientName: open[0]!.client.name, status: 'offered' },
    ]);

    // A walk-in goes into the same window first: the offered 10:50 toner no longer fits Ana's hands.
    const filled = await desk$.write('post', '/api/windows/fill', {
      stylistId: ana.staffId,
      serviceId: toner,
      start: localIso(thursday, '10:45'),
      walkIn: { name: 'Walk-in Uma' },
      idempotencyKey: 'fill-key-0005',
    });
    expect(filled.status).toBe(201);
    const visitor = await anonymousAgent(t.app);
    expect((await visitor.get(`/api/offers/${token}`)).body.status).toBe('gone');
    const late = await visitor.write('post', `/api/offers/${token}/accept`);
    expect(late.status).toBe(409);
    const after = (await desk$.get(`/api/windows?date=${thursday}`)).body;
    const shown = [...after.closedOffers, ...after.windows.flatMap((w: { offers: unknown[] }) => w.offers)];
    expect(shown).toMatchObject([{ clientName: open[0]!.client.name, serviceName: 'Toner refresh', status: 'gone' }]);
    // The client is told through the send log (once per channel), not left to find out at the door.
    const offerRow = await t.testDb.db
      .selectFrom('window_offers')
      .select('id')
      .where('client_id', '=', open[0]!.client.id)
      .where('starts_at', '=', new Date(localIso(thursday, '10:50')))
      .executeTakeFirstOrThrow();
    const gone = await t.testDb.db.selectFrom('messages').select(['channel']).where('dedupe_key', 'like', `offer:${offerRow.id}:window_offer_gone:%`).execute();
    expect(gone.map((g) => g.channel).sort()).toEqual(['email', 'sms']);
  });
});
