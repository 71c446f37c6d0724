import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser } from '../factories/user';
import { insertService, insertTestBooking } from '../factories/booking';
import { setupPaths } from '../setup/setup-paths';

// Writes that check first ("is this e-mail taken?") and then insert: ten at once all pass the check, and the
// database's unique constraint lets exactly one in. The others must hear a conflict naming the field (409), never
// a 500.
let t: TestApp;
let salon: SalonFixture;
let owner$: Awaited<ReturnType<typeof signedInAgent>>;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;
let bookingId: string;

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db);
  const owner = await insertUser(db, salon.salonId, 'owner');
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  const stylist = await insertUser(db, salon.salonId, 'stylist');
  const client = await insertUser(db, salon.salonId, 'client');
  owner$ = await signedInAgent(t.app, owner.email, owner.password);
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
  bookingId = await insertTestBooking(db, {
    salonId: salon.salonId,
    clientId: client.clientId!,
    stylistId: stylist.staffId!,
    chairId: salon.chairs[0]!,
    serviceId: await insertService(db, salon.salonId),
    steps: [['hands_on', new Date(Date.now() + 86_400_000).toISOString(), new Date(Date.now() + 86_400_000 + 1_800_000).toISOString()]],
  });
});
afterAll(() => t.close());

/** Exactly one of the answers is `won`; every other is 409 with `code`, naming `field`. */
function oneWinner(
  results: { status: number; body: { error?: { code: string; fields?: Record<string, string> } } }[],
  won: number,
  code: string,
  field: string,
) {
  expect(results.map((r) => r.status).sort()).toEqual([won, ...Array<number>(results.length - 1).fill(409)]);
  for (const lost of results.filter((r) => r.status === 409)) {
    expect(lost.body.error?.code).toBe(code);
    expect(lost.body.error?.fields?.[field]).toBeTruthy();
  }
}

describe('ten requests at once for one unique thing', () => {
  it('sign-ups with one e-mail: one account, nine 409 EMAIL_TAKEN', async () => {
    const body = { name: 'Robin Ash', email: 'race.signup@example.test', phone: '+1 970 555 0199', password: 'copper-kettle-meadow-7' };
    const callers = await Promise.all(Array.from({ length: 10 }, () => anonymousAgent(t.app)));
    oneWinner(await Promise.all(callers.map((c) => c.write('post', '/api/sign-up', body))), 201, 'EMAIL_TAKEN', 'email');
    expect(await t.testDb.db.selectFrom('users').select('id').where('email', '=', body.email).execute()).toHaveLength(1);
  });

  it('staff invites with one e-mail: one member of staff, nine 409 EMAIL_TAKEN', async () => {
    const hours = [{ rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '09:00', end: '18:00' }];
    const details = { name: 'Rowan Vale', role: 'stylist', skills: ['colour'], maxClientsAtOnce: 2, hours };
    const results = await Promise.all(Array.from({ length: 10 }, () => owner$.write('post', setupPaths.staff, { email: 'race.invite@example.test', details })));
    oneWinner(results, 201, 'EMAIL_TAKEN', 'email');
    expect(await t.testDb.db.selectFrom('users').select('id').where('email', '=', 'race.invite@example.test').execute()).toHaveLength(1);
  });

  it('one mix-log bowl saved ten times: one bowl, nine 409 naming bowlNo', async () => {
    const bowl = {
      sittingSeq: 1,
      bowlNo: 1,
      productType: 'toner',
      shadeNotes: '9V',
      developerPercent: 3,
      ratio: '1:2',
      grams: [{ kind: 'toner', part: '9V', grams: 30 }],
      appliedTo: 'All over',
      plannedMinutes: 20,
      actualMinutes: null,
      heat: false,
      resultNotes: '',
    };
    const results = await Promise.all(Array.from({ length: 10 }, () => desk$.write('post', `/api/bookings/${bookingId}/mix-logs`, bowl)));
    oneWinner(results, 201, 'CONFLICT', 'bowlNo');
    expect(await t.testDb.db.selectFrom('mix_logs').select('id').where('booking_id', '=', bookingId).execute()).toHaveLength(1);
  });

  it('one chair name added ten times: one chair, nine 409 naming name', async () => {
    const results = await Promise.all(Array.from({ length: 10 }, () => owner$.write('post', setupPaths.unitsOf('chairs'), { name: 'Window chair' })));
    oneWinner(results, 201, 'CONFLICT', 'name');
  });
});
