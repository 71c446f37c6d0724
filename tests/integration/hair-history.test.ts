import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { emptyHairHistory, type HairHistory } from '@shared/schemas/hair-history.schemas';

let t: TestApp;
let client: UserFixture, otherClient: UserFixture, stylist: UserFixture, desk: UserFixture, otherSalonStylist: UserFixture;

const answers: HairHistory = {
  ...emptyHairHistory(),
  currentColour: 'Faded copper over natural level 5',
  currentColourMethod: 'mixed',
  pastServices: [{ service: 'Full head bleach', when: 'March 2026' }],
  plantDyes: { answer: 'yes', details: 'Henna, summer 2025' },
  previousReaction: { answer: 'no', details: '' },
  medicalNotes: 'Private note',
};

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  const { salonId } = await insertSalon(db);
  [client, otherClient, stylist, desk] = await Promise.all([
    insertUser(db, salonId, 'client'),
    insertUser(db, salonId, 'client'),
    insertUser(db, salonId, 'stylist'),
    insertUser(db, salonId, 'front_desk'),
  ]);
  otherSalonStylist = await insertUser(db, (await insertSalon(db)).salonId, 'stylist');
});
afterAll(() => t.close());

const as = (u: UserFixture) => signedInAgent(t.app, u.email, u.password);
const stored = () => t.testDb.db.selectFrom('hair_histories').select('answers').where('client_id', '=', client.clientId!).executeTakeFirst();

describe('PUT /api/me/hair-history', () => {
  it('when a client saves the form, stores it and answers it back', async () => {
    const c = await as(client);
    const before = await c.get('/api/me/hair-history');
    expect(before.body).toEqual({ answers: null, updatedAt: null });

    const res = await c.write('put', '/api/me/hair-history', answers);
    expect(res.status).toBe(200);
    expect(res.body.answers).toEqual(answers);
    expect((await stored())?.answers).toEqual(answers);
    expect((await c.get('/api/me/hair-history')).body.answers).toEqual(answers);
  });

  it('when a previous reaction is "yes" without details, or an unknown field is sent, responds 400 and keeps the old answers', async () => {
    const c = await as(client);
    const noDetails = await c.write('put', '/api/me/hair-history', { ...answers, previousReaction: { answer: 'yes', details: '' } });
    expect(noDetails.status).toBe(400);
    expect(noDetails.body.error.fields).toHaveProperty(['previousReaction.details']);
    const extra = await c.write('put', '/api/me/hair-history', { ...answers, shoeSize: 9 });
    expect(extra.status).toBe(400);
    const tooLong = await c.write('put', '/api/me/hair-history', { ...answers, medicalNotes: 'x'.repeat(1001) });
    expect(tooLong.status).toBe(400);
    expect((await stored())?.answers).toEqual(answers);
  });
});

describe('GET/PUT /api/clients/:id/hair-history', () => {
  const path = () => `/api/clients/${client.clientId}/hair-history`;

  it('when the owning client or the salon’s stylist reads it, responds 200 with the answers', async () => {
    for (const u of [client, stylist]) {
      const res = await (await as(u)).get(path());
      expect(res.status).toBe(200);
      expect(res.body.answers.medicalNotes).toBe('Private note');
    }
  });

  it('when the salon’s front desk edits it, saves it', async () => {
    const res = await (await as(desk)).write('put', path(), { ...answers, scalpConditions: 'Mild psoriasis at the nape' });
    expect(res.status).toBe(200);
    expect(((await stored())?.answers as HairHistory).scalpConditions).toBe('Mild psoriasis at the nape');
  });

  it('when another client or another salon’s stylist asks, responds 404 and changes nothing', async () => {
    const before = (await stored())?.answers;
    for (const u of [otherClient, otherSalonStylist]) {
      const c = await as(u);
      const read = await c.get(path());
      expect(read.status).toBe(404);
      expect(read.body.error.code).toBe('NOT_FOUND');
      expect(JSON.stringify(read.body)).not.toContain('Private note');
      expect((await c.write('put', path(), { ...answers, medicalNotes: 'overwritten' })).status).toBe(404);
    }
    expect((await stored())?.answers).toEqual(before);
  });

  it('when the client id does not exist, answers the same 404 as a hidden one', async () => {
    const res = await (await as(stylist)).get('/api/clients/00000000-0000-4000-8000-000000000000/hair-history');
    expect(res.status).toBe(404);
  });

  it('when signed out, responds 401', async () => {
    expect((await (await anonymousAgent(t.app)).get(path())).status).toBe(401);
  });
});
