import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import ICAL from 'ical.js';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertPlannedService } from '../factories/service';
import { futureWeekday, localIso } from '../setup/dates';
import { sendDueMessages } from '@server/features/messages/send-message.job';

// Markup and calendar/CSV metacharacters typed into text fields are data: stored and answered exactly as
// typed, sent as plain text (e-mail, SMS) and escaped where a format demands it (.ics, RFC 5545 §3.3.11).
const NAME = `<img src=x onerror=alert(1)> O'Brien "Ann" & co`;
const NOTES = `<script>fetch('/api/clients')</script>\n=HYPERLINK("http://evil.test","x"); -2+3 , \\ done`;
const SERVICE = `Gloss <b>shine</b>; toner, warm \\ cool`;
const ADDRESS = `1 Main St; Suite "B", <i>Denver</i>\nCO \\ USA`;

let t: TestApp;
let salon: SalonFixture;
let stylist: UserFixture;
let desk: Awaited<ReturnType<typeof signedInAgent>>;
let serviceId: string;
const plan = { sittings: [{ steps: [{ kind: 'hands_on' as const, label: 'Gloss', product: 'toner_direct' as const, minutes: 30 }] }] };

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db);
  await db.updateTable('salons').set({ address: ADDRESS }).where('id', '=', salon.salonId).execute();
  stylist = await insertUser(db, salon.salonId, 'stylist');
  serviceId = await insertPlannedService(db, salon.salonId, { plan, name: SERVICE });
  const deskUser = await insertUser(db, salon.salonId, 'front_desk');
  desk = await signedInAgent(t.app, deskUser.email, deskUser.password);
});
afterAll(() => t.close());

describe('markup in text fields', () => {
  let clientId: string;

  it('is stored and answered exactly as typed (the client UI renders it as text through React)', async () => {
    const res = await desk.write('post', '/api/clients', { name: NAME, email: 'ann.hostile@example.test', phone: '+19705557001', notes: NOTES });
    expect(res.status).toBe(201);
    clientId = res.body.id;
    const row = await t.testDb.db.selectFrom('clients').select(['name', 'notes']).where('id', '=', clientId).executeTakeFirstOrThrow();
    expect(row).toEqual({ name: NAME, notes: NOTES });
    const card = await desk.get(`/api/clients/${clientId}`);
    expect(card.status).toBe(200);
    expect(JSON.stringify(card.body)).toContain(JSON.stringify(NAME).slice(1, -1));
    expect(card.headers['content-type']).toMatch(/^application\/json/);
    const found = await desk.get(`/api/clients?q=${encodeURIComponent("O'Brien")}`);
    expect(found.body.clients.map((c: { id: string }) => c.id)).toContain(clientId);
  });

  it('goes out as plain text in the e-mail and SMS, and escaped in the calendar file', async () => {
    const date = futureWeekday(3, 3);
    const booked = await desk.write('post', '/api/bookings', {
      clientId,
      serviceId,
      stepPlan: plan,
      stylistId: stylist.staffId,
      start: localIso(date, '10:00'),
      idempotencyKey: 'hostile-text-1',
    });
    expect(booked.status).toBe(201);
    // The confirmation SMS may wait for the end of quiet hours: send as of its own planned time.
    const smsRow = await t.testDb.db
      .selectFrom('messages')
      .select('send_at')
      .where('booking_id', '=', booked.body.id)
      .where('kind', '=', 'confirmation')
      .where('channel', '=', 'sms')
      .executeTakeFirstOrThrow();
    await sendDueMessages(t.testDb.db, t.outside, smsRow.send_at, booked.body.id);

    const mail = t.smtp.messages.find((m) => m.to === 'ann.hostile@example.test');
    expect(mail).toBeDefined();
    // The mailer sends text only (no HTML part), so markup cannot run in a mail reader; it arrives verbatim.
    expect(mail!.text).toContain('Hello <img');
    expect(mail!.text).toContain(SERVICE);
    expect(mail!.subject).not.toMatch(/[\r\n]/);

    const sms = t.sms.messages.find((m) => m.to === '+19705557001');
    expect(sms?.body).toContain(SERVICE);

    const ics = mail!.attachments.find((a) => a.filename.endsWith('.ics'))!.content;
    // RFC 5545 §3.3.11: in TEXT values a backslash is written \\, a semicolon \;, a comma \, and a newline \n.
    const unfolded = ics.replace(/\r\n[ \t]/g, '');
    const location = unfolded.split('\r\n').find((l) => l.startsWith('LOCATION'))!;
    expect(location).toBe(`LOCATION:1 Main St\\; Suite "B"\\, <i>Denver</i>\\nCO \\\\ USA`);
    // An independent RFC 5545 parser (ical.js) reads every value back exactly as typed.
    const event = new ICAL.Component(ICAL.parse(ics)).getFirstSubcomponent('vevent')!;
    expect(event.getFirstPropertyValue('location')).toBe(ADDRESS);
    expect(event.getFirstPropertyValue('summary')).toBe(
      `${SERVICE} at ${(await t.testDb.db.selectFrom('salons').select('name').where('id', '=', salon.salonId).executeTakeFirstOrThrow()).name}`,
    );
  });
});

describe('the client app', () => {
  it('renders text only through React (which escapes it): no raw HTML insertion anywhere in src/', () => {
    const files = readdirSync('src', { recursive: true, withFileTypes: true })
      .filter((f) => f.isFile() && /\.(tsx?|html)$/.test(f.name))
      .map((f) => join(f.parentPath, f.name));
    expect(files.length).toBeGreaterThan(20);
    const raw = files.filter((f) => /dangerouslySetInnerHTML|\.innerHTML\s*=|insertAdjacentHTML|document\.write/.test(readFileSync(f, 'utf8')));
    expect(raw).toEqual([]);
  });
});
