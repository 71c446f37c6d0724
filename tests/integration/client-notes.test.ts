import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser } from '../factories/user';

let t: TestApp;
let salon: SalonFixture;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;
let stylist$: Awaited<ReturnType<typeof signedInAgent>>;
let clientId: string;

beforeAll(async () => {
  t = await startTestApp();
  salon = await insertSalon(t.testDb.db, { chairs: 1, basins: 1 });
  const desk = await insertUser(t.testDb.db, salon.salonId, 'front_desk');
  const stylist = await insertUser(t.testDb.db, salon.salonId, 'stylist');
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
  stylist$ = await signedInAgent(t.app, stylist.email, stylist.password);
  const added = await desk$.write('post', '/api/clients', { name: 'Rhea Lund', email: 'rhea@example.test' });
  expect(added.status).toBe(201);
  clientId = added.body.id;
});
afterAll(() => t.close());

describe('PUT /api/clients/:id/notes', () => {
  it('the desk writes notes on the card; they show on the card and the change is audited with what was there before', async () => {
    const saved = await desk$.write('put', `/api/clients/${clientId}/notes`, { notes: '  Prefers early mornings.\nSensitive scalp: go gently.  ' });
    expect(saved.status).toBe(200);
    expect(saved.body).toEqual({ notes: 'Prefers early mornings.\nSensitive scalp: go gently.' });
    expect((await desk$.get(`/api/clients/${clientId}`)).body.notes).toBe('Prefers early mornings.\nSensitive scalp: go gently.');
    const audit = await t.testDb.db
      .selectFrom('audit_log')
      .select(['action', 'before', 'after'])
      .where('entity', '=', 'client')
      .where('entity_id', '=', clientId)
      .where('action', '=', 'notes_changed')
      .execute();
    expect(audit).toHaveLength(1);
    expect(audit[0]?.before).toEqual({ notes: '' });
  });

  it('a stylist may add to them too', async () => {
    const saved = await stylist$.write('put', `/api/clients/${clientId}/notes`, { notes: 'Likes a cool toner.' });
    expect(saved.status).toBe(200);
    expect((await desk$.get(`/api/clients/${clientId}`)).body.notes).toBe('Likes a cool toner.');
  });

  it('refuses notes longer than 4,000 characters, naming the field, and a client that is not there', async () => {
    const long = await desk$.write('put', `/api/clients/${clientId}/notes`, { notes: 'x'.repeat(4001) });
    expect(long.status).toBe(400);
    expect(long.body.error.fields.notes).toBe('At most 4,000 characters');
    const missing = await desk$.write('put', '/api/clients/00000000-0000-4000-8000-000000000000/notes', { notes: 'Hello' });
    expect(missing.status).toBe(404);
  });
});
