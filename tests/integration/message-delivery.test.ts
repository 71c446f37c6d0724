import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertPlannedService } from '../factories/service';
import { messageDesk } from '../factories/messages';
import { localIso } from '../setup/dates';
import { SEND_MESSAGE_JOB, scheduleMessageJobs, sendDueMessages } from '@server/features/messages/send-message.job';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';

let t: TestApp;
let salon: SalonFixture;
let ana: UserFixture;
let m: Awaited<ReturnType<typeof messageDesk>>;
let serviceId: string;
const db = () => t.testDb.db;
const plan: StepPlan = { sittings: [{ steps: [{ kind: 'hands_on', label: 'Gloss', product: 'toner_direct', minutes: 30 }] }] };

beforeAll(async () => {
  t = await startTestApp();
  salon = await insertSalon(db());
  ana = await insertUser(db(), salon.salonId, 'stylist', { hours: { rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '09:00', end: '21:00' } });
  serviceId = await insertPlannedService(db(), salon.salonId, { plan, name: 'Gloss', category: 'treatment', depositCents: 0 });
  m = await messageDesk(t, salon.salonId, ana.staffId!);
});
afterAll(() => t.close());

describe('delivery', () => {
  it('a booking moved five times: only the latest reminders go out', async () => {
    const c = await m.newClient();
    const id = await m.book(serviceId, plan, '2027-06-01', '10:00', c.clientId!);
    const moves: [string, string][] = [
      ['2027-06-02', '11:00'],
      ['2027-06-03', '12:00'],
      ['2027-06-04', '13:00'],
      ['2027-06-05', '14:00'],
      ['2027-06-08', '15:00'],
    ];
    for (const [date, hhmm] of moves) {
      expect((await m.desk$.write('post', `/api/bookings/${id}/move`, { sitting: 1, start: localIso(date, hhmm) })).status).toBe(200);
    }
    // The live queue sends a change notice as soon as it is due; on a slow machine one may go before the next
    // move replaces it, and that is right. What must never happen is a replaced notice going out afterwards.
    const movedLive = m.smsTo(c.phone).filter((s) => s.body.includes('moved')).length;
    // Run the sender over the whole stretch, as the per-minute sweep would.
    for (const day of ['2027-05-31', '2027-06-01', '2027-06-02', '2027-06-03', '2027-06-04', '2027-06-05', '2027-06-06', '2027-06-07', '2027-06-08']) {
      await sendDueMessages(db(), t.outside, new Date(localIso(day, '23:00')), id);
    }
    const reminders = m.smsTo(c.phone).filter((s) => s.body.includes('reminder'));
    expect(reminders).toHaveLength(2);
    // Tue 2027-06-08 15:00 MDT: the 48 h and 24 h reminders of the sixth version only.
    expect(reminders.every((s) => s.body.includes('Tuesday 8 June 2027 at 3:00 PM'))).toBe(true);
    const rows = await m.messagesOf(id);
    expect(rows.filter((r) => r.kind.startsWith('reminder') && r.status === 'sent').every((r) => r.booking_version === 6)).toBe(true);
    // The change notices still queued at each next move were replaced: after the moves, only the one with the
    // final time goes, once (if the live queue had not already sent it).
    const moved = m.smsTo(c.phone).filter((s) => s.body.includes('moved'));
    expect(moved.slice(movedLive).every((s) => s.body.includes('Tuesday 8 June 2027 at 3:00 PM'))).toBe(true);
    expect(moved.filter((s) => s.body.includes('Tuesday 8 June 2027 at 3:00 PM'))).toHaveLength(1);
    expect(moved.at(-1)!.body).toContain('Tuesday 8 June 2027 at 3:00 PM');
  });

  it('SMS service down for 10 minutes: the queued texts go out when it returns, in order, none twice', async () => {
    await sendDueMessages(db(), t.outside, new Date()); // nothing else due may take the fake's failures
    const T = new Date('2027-06-15T16:00:00Z').getTime();
    const clients = [await m.newClient(), await m.newClient(), await m.newClient()];
    const ids: string[] = [];
    for (const [i, c] of clients.entries()) {
      const row = await db()
        .insertInto('messages')
        .values({
          salon_id: salon.salonId,
          client_id: c.clientId!,
          kind: 'reminder_24h',
          channel: 'sms',
          to_address: c.phone,
          body: `outage text ${i + 1}`,
          send_at: new Date(T + i * 2 * 60_000),
          dedupe_key: `outage:${i}:${T}`,
        })
        .returning('id')
        .executeTakeFirstOrThrow();
      ids.push(row.id);
    }
    t.sms.failNext(1_000_000); // down
    for (let minute = 0; minute <= 30; minute++) {
      if (minute === 10) t.sms.failNext(0); // back
      await sendDueMessages(db(), t.outside, new Date(T + minute * 60_000));
    }
    const received = t.sms.messages.filter((s) => s.body.startsWith('outage text'));
    expect(received.map((s) => s.body)).toEqual(['outage text 1', 'outage text 2', 'outage text 3']);
    const rows = await db().selectFrom('messages').select(['id', 'status', 'attempts']).where('id', 'in', ids).execute();
    expect(rows.every((r) => r.status === 'sent')).toBe(true);
    // The first text kept retrying (1, 2, 4, 8 minutes) and the later ones waited behind it instead of overtaking.
    expect(rows.find((r) => r.id === ids[0])!.attempts).toBe(5);
  });

  it('each message due soon gets its own job at its exact instant; the claim keeps it to one send', async () => {
    const c = await m.newClient();
    const due = new Date(Date.now() + 2500);
    const { id } = await db()
      .insertInto('messages')
      .values({
        salon_id: salon.salonId,
        client_id: c.clientId!,
        kind: 'reminder_24h',
        channel: 'sms',
        to_address: c.phone,
        body: 'on the dot',
        send_at: due,
        dedupe_key: `exact:${due.getTime()}`,
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    const queued: string[] = [];
    const schedule = async (messageId: string, at: Date) => {
      queued.push(messageId);
      await t.jobs.schedule(SEND_MESSAGE_JOB, { messageId }, at);
    };
    expect(await scheduleMessageJobs(db(), schedule, new Date())).toBeGreaterThanOrEqual(1);
    expect(queued).toContain(id);
    expect(await scheduleMessageJobs(db(), schedule, new Date())).toBe(0); // already queued for that instant
    let row = await db().selectFrom('messages').selectAll().where('id', '=', id).executeTakeFirstOrThrow();
    expect(row.job_at!.getTime()).toBe(due.getTime());
    for (let i = 0; i < 100 && row.status !== 'sent'; i++) {
      await new Promise((r) => setTimeout(r, 200));
      row = await db().selectFrom('messages').selectAll().where('id', '=', id).executeTakeFirstOrThrow();
    }
    expect(row.status).toBe('sent');
    expect(row.sent_at!.getTime()).toBeGreaterThanOrEqual(due.getTime()); // never early
    expect(m.smsTo(c.phone).filter((s) => s.body === 'on the dot')).toHaveLength(1);
  });
});
