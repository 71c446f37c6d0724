import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DateTime } from 'luxon';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { correctionPlan, insertPlannedService } from '../factories/service';
import { messageDesk } from '../factories/messages';
import { localIso } from '../setup/dates';
import { sendMessage } from '@server/features/messages/send-message.job';
import { planStaffMessages } from '@server/features/messages/staff-messages.service';
import { followUpTimes } from '@shared/messages/follow-up-times';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';

let t: TestApp;
let salon: SalonFixture;
let ana: UserFixture;
let m: Awaited<ReturnType<typeof messageDesk>>;
let owner$: Awaited<ReturnType<typeof signedInAgent>>;
const Z = 'America/Denver';
const db = () => t.testDb.db;
// An hour in the chair: lightener on for 20 min (within the 50 min processing limit), rinsed, then toned and finished.
const hour: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'hands_on', label: 'Apply lightener', product: 'lightener', minutes: 20 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 10 },
        { kind: 'hands_on', label: 'Tone and finish', product: 'toner_direct', minutes: 30 },
      ],
    },
  ],
};
const patch: StepPlan = { sittings: [{ steps: [{ kind: 'hands_on', label: 'Apply skin test', product: 'none', minutes: 15 }] }] };
let lightening: string;
let correction: string;
let skinTest: string;
let cut: string;

beforeAll(async () => {
  t = await startTestApp();
  salon = await insertSalon(db());
  // Open Mondays too, so sittings can fall the day after each daylight-saving change (both on Sundays).
  await db().insertInto('salon_hours').values({ salon_id: salon.salonId, rrule: 'FREQ=WEEKLY;BYDAY=MO', start_time: '09:00', end_time: '21:00' }).execute();
  ana = await insertUser(db(), salon.salonId, 'stylist', {
    skills: ['colour', 'cut'],
    hours: { rrule: 'FREQ=WEEKLY;BYDAY=MO,TU,WE,TH,FR,SA', start: '09:00', end: '21:00' },
  });
  lightening = await insertPlannedService(db(), salon.salonId, { plan: hour, name: 'Full lightening' });
  correction = await insertPlannedService(db(), salon.salonId, { plan: correctionPlan, name: 'Colour correction' });
  skinTest = await insertPlannedService(db(), salon.salonId, { plan: patch, name: 'Skin test', category: 'skin_test', depositCents: 0 });
  cut = await insertPlannedService(db(), salon.salonId, { plan: hour, name: 'Cut & finish', category: 'cut', skill: 'cut', depositCents: 0 });
  m = await messageDesk(t, salon.salonId, ana.staffId!);
  const owner = await insertUser(db(), salon.salonId, 'owner');
  owner$ = await signedInAgent(t.app, owner.email, owner.password);
});
afterAll(() => t.close());

describe('message kinds, each at its instant in the salon’s zone', () => {
  it('skin test booked: what it is, the lead time before colour, what to do about a reaction, the cautions', async () => {
    const c = await m.newClient();
    const id = await m.book(skinTest, patch, '2027-04-06', '10:00', c.clientId!);
    const rows = await m.messagesOf(id);
    expect(rows.filter((r) => r.kind === 'confirmation')).toEqual([]);
    const email = rows.find((r) => r.kind === 'skin_test_booked' && r.channel === 'email')!;
    // The salon's lead time (48 h by default; common practice and the colour makers' instruction for oxidative dyes).
    expect(email.body).toMatch(/applied at least 48 hours before your colour appointment and read before it/);
    expect(email.body).toMatch(/Any reaction means no oxidative colour until it has been cleared/);
    expect(email.body).toMatch(/itching, burning, redness or swelling/);
    expect(email.body).toMatch(/licensed practice and local regulations/);
    expect(rows.find((r) => r.kind === 'skin_test_booked' && r.channel === 'sms')!.body).toMatch(/at least 48 h before your colour/);
  });

  it('"day 2 of 2" the evening before a later sitting, at 18:00 salon time, across the spring change', async () => {
    // IANA tz database, America/Denver: MST (UTC−7) until Sunday 2027-03-14 02:00, then MDT (UTC−6).
    expect(DateTime.fromISO('2027-03-14T18:00', { zone: Z }).offset).toBe(-360);
    const c = await m.newClient();
    const id = await m.book(correction, correctionPlan, '2027-03-13', '09:00', c.clientId!);
    expect((await m.desk$.write('post', `/api/bookings/${id}/move`, { sitting: 2, start: localIso('2027-03-15', '10:00') })).status).toBe(200);
    // Sunday 2027-03-14 18:00 MDT = 2027-03-15T00:00Z (not 01:00Z, which the winter offset would give).
    expect(await m.planned(id, 'day_before_sitting')).toEqual([
      'day_before_sitting email 2027-03-15T00:00:00.000Z',
      'day_before_sitting sms 2027-03-15T00:00:00.000Z',
    ]);
    const sms = (await m.messagesOf(id)).find((r) => r.kind === 'day_before_sitting' && r.status === 'queued' && r.channel === 'sms')!;
    expect(sms.body).toMatch(/tomorrow is day 2 of 2 of your Colour correction, Monday 15 March 2027 at 10:00 AM MDT/);
  });

  it('aftercare the day after a colour sitting, at 10:00 salon time, across the autumn change; none for a cut', async () => {
    // IANA tz database, America/Denver: MDT (UTC−6) until Sunday 2027-11-07 02:00, then MST (UTC−7).
    expect(DateTime.fromISO('2027-11-07T10:00', { zone: Z }).offset).toBe(-420);
    const c = await m.newClient();
    const id = await m.book(lightening, hour, '2027-11-06', '10:00', c.clientId!);
    expect(await m.planned(id, 'aftercare')).toEqual(['aftercare email 2027-11-07T17:00:00.000Z', 'aftercare sms 2027-11-07T17:00:00.000Z']);
    const email = (await m.messagesOf(id)).find((r) => r.kind === 'aftercare' && r.channel === 'email')!;
    expect(email.body).toMatch(/bond-building/); // the lightening notes, not the generic ones
    const cutId = await m.book(cut, hour, '2027-11-09', '10:00', c.clientId!);
    expect(await m.planned(cutId, 'aftercare')).toEqual([]);
  });

  it('reminders carry the service’s preparation notes and how to move or cancel', async () => {
    const c = await m.newClient();
    const id = await m.book(lightening, hour, '2027-04-08', '10:00', c.clientId!);
    const reminder = (await m.messagesOf(id)).find((r) => r.kind === 'reminder_24h' && r.channel === 'email')!;
    expect(reminder.body).toMatch(/Come with dry hair.*eat beforehand/s);
    expect(reminder.body).toMatch(/To move or cancel, open My bookings/);
  });
});

describe('follow-up rules (owner)', () => {
  it('refuses an RRULE it cannot use, naming the field, and stores nothing', async () => {
    for (const rrule of ['FREQ=SOMETIMES;COUNT=1', 'FREQ=WEEKLY;INTERVAL=6', 'DTSTART=20270101T000000Z;FREQ=WEEKLY;COUNT=1']) {
      const res = await owner$.write('post', '/api/owner/follow-up-rules', { serviceId: lightening, title: 'Toner refresh', text: 'Time for a toner?', rrule });
      expect(res.status, rrule).toBe(400);
      expect(Object.keys(res.body.error.fields)).toEqual(['rrule']);
    }
    expect((await owner$.get('/api/owner/follow-up-rules')).body.rules).toEqual([]);
    expect((await m.desk$.get('/api/owner/follow-up-rules')).status).toBe(403);
  });

  it('plans a toner refresh 6 weeks after the sitting ends, same local time across DST, only for clients who opted in; edits re-plan', async () => {
    const yes = await m.newClient();
    const no = await m.newClient();
    await db().updateTable('clients').set({ marketing_opt_in: true }).where('id', '=', yes.clientId!).execute();
    const a = await m.book(lightening, hour, '2027-02-20', '10:00', yes.clientId!);
    const res = await owner$.write('post', '/api/owner/follow-up-rules', {
      serviceId: lightening,
      title: 'Toner <b>refresh</b>',
      text: 'Your lightening is 6 weeks old: a toner refresh keeps it bright & cool.',
      rrule: 'FREQ=WEEKLY;INTERVAL=6;COUNT=1',
    });
    expect(res.status).toBe(201);
    const b = await m.book(lightening, hour, '2027-02-20', '12:00', no.clientId!);
    // RFC 5545 (3.3.10): WEEKLY;INTERVAL=6 from DTSTART Sat 2027-02-20 11:00 (sitting end) → Sat 2027-04-03 11:00 local,
    // the wall-clock time kept across the change; IANA tz database: Denver is MDT (UTC−6) then → 17:00Z.
    expect(await m.planned(a, 'follow_up')).toEqual(['follow_up email 2027-04-03T17:00:00.000Z', 'follow_up sms 2027-04-03T17:00:00.000Z']);
    expect(await m.planned(b, 'follow_up')).toEqual([]);

    const edit = await owner$.write('put', `/api/owner/follow-up-rules/${res.body.id}`, {
      serviceId: lightening,
      title: 'Toner refresh',
      text: 'Time for a toner refresh?',
      rrule: 'FREQ=WEEKLY;INTERVAL=8;COUNT=1',
    });
    expect(edit.status).toBe(200);
    expect(edit.body.version).toBe(2);
    expect(await m.planned(a, 'follow_up')).toEqual(['follow_up email 2027-04-17T17:00:00.000Z', 'follow_up sms 2027-04-17T17:00:00.000Z']);
    expect((await owner$.write('delete', `/api/owner/follow-up-rules/${res.body.id}`)).status).toBe(204);
    expect(await m.planned(a, 'follow_up')).toEqual([]);
  });

  it('the preview helper counts COUNT as sends after the anchor (RFC 5545 counts DTSTART as the first instance)', () => {
    const end = new Date(localIso('2027-01-09', '15:00'));
    // Every 4 weeks, 3 sends: 2027-02-06, 03-06 (both MST, UTC−7) and 04-03 (MDT, UTC−6), at 15:00 local.
    expect(followUpTimes('FREQ=WEEKLY;INTERVAL=4;COUNT=3', end, Z).map((d) => d.toISOString())).toEqual([
      '2027-02-06T22:00:00.000Z',
      '2027-03-06T22:00:00.000Z',
      '2027-04-03T21:00:00.000Z',
    ]);
  });
});

describe('simple HTML e-mail', () => {
  it('escapes every interpolated text, so a client’s name renders as text', async () => {
    const c = await m.newClient();
    await db().updateTable('clients').set({ name: '<b>Jo</b> & "Kim"' }).where('id', '=', c.clientId!).execute();
    const id = await m.book(lightening, hour, '2027-04-09', '10:00', c.clientId!);
    const row = (await m.messagesOf(id)).find((r) => r.kind === 'confirmation' && r.channel === 'email')!;
    expect(await sendMessage(db(), t.outside, row.id, new Date())).toBe('sent');
    const mail = t.smtp.messages.find((x) => x.to === c.email && x.subject === row.subject)!;
    expect(mail.text).toContain('Hello <b>Jo</b>,');
    expect(mail.html).toContain('Hello &lt;b&gt;Jo&lt;/b&gt;,');
    expect(mail.html).toContain('You&#39;re booked');
    expect(mail.html).not.toContain('<b>');
  });
});

describe('staff messages, at 18:00 in the salon’s zone', () => {
  it('each stylist gets tomorrow’s list and the desk the bookings whose deposit is unpaid, once', async () => {
    const c = await m.newClient();
    await m.book(lightening, hour, '2027-03-15', '14:00', c.clientId!);
    // IANA tz database: Sunday 2027-03-14 is the first MDT day (UTC−6), so 18:00 local = 2027-03-15T00:00Z.
    expect(await planStaffMessages(db(), new Date('2027-03-14T23:59:00Z'))).toEqual([]);
    const planned = await planStaffMessages(db(), new Date('2027-03-15T00:00:00Z'));
    const rows = await db()
      .selectFrom('messages')
      .selectAll()
      .where(
        'id',
        'in',
        planned.map((p) => p.id),
      )
      .execute();
    const stylistList = rows.find((r) => r.kind === 'stylist_day_list')!;
    expect(stylistList.to_address).toBe(ana.email);
    expect(stylistList.body).toMatch(/2:00 PM – 3:00 PM {2}Client \d+: Full lightening/);
    const desk = rows.filter((r) => r.kind === 'desk_no_deposit_list');
    expect(desk.length).toBeGreaterThanOrEqual(1);
    expect(desk[0]!.body).toMatch(/Full lightening — deposit \$50\.00 not paid/);
    expect(await planStaffMessages(db(), new Date('2027-03-15T01:00:00Z'))).toEqual([]);
  });
});
