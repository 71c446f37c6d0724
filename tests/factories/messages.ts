import { expect } from 'vitest';
import type { TestApp } from '../setup/test-app';
import { signedInAgent } from '../setup/test-app';
import { insertUser } from './user';
import { localIso } from '../setup/dates';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';

let phones = 0;

/** A salon's desk as the message tests use it: new clients with their own numbers, bookings, the send log. */
export async function messageDesk(t: TestApp, salonId: string, stylistId: string) {
  const db = t.testDb.db;
  const desk = await insertUser(db, salonId, 'front_desk');
  const desk$ = await signedInAgent(t.app, desk.email, desk.password);
  return {
    desk$,
    /** A client reachable by e-mail and SMS, on a number of their own (so the fake's texts can be counted). */
    async newClient() {
      const client = await insertUser(db, salonId, 'client');
      const phone = `+1720555${String(3000 + ++phones + Math.floor(Math.random() * 5000)).slice(-4)}`;
      await db.updateTable('clients').set({ phone }).where('id', '=', client.clientId!).execute();
      return { ...client, phone };
    },
    async book(serviceId: string, plan: StepPlan, date: string, hhmm: string, clientId: string): Promise<string> {
      const res = await desk$.write('post', '/api/bookings', {
        clientId,
        serviceId,
        stepPlan: plan,
        stylistId,
        start: localIso(date, hhmm),
        idempotencyKey: `mk-${date}-${hhmm}-${clientId}`,
      });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      return res.body.id as string;
    },
    messagesOf: (bookingId: string) =>
      db.selectFrom('messages').selectAll().where('booking_id', '=', bookingId).orderBy('send_at').orderBy('channel').execute(),
    /** "kind channel instant" of every message still planned or sent for the booking. */
    async planned(bookingId: string, kind?: string) {
      const rows = await db
        .selectFrom('messages')
        .selectAll()
        .where('booking_id', '=', bookingId)
        .where('status', '!=', 'dropped')
        .orderBy('send_at')
        .orderBy('channel')
        .execute();
      return rows.filter((m) => !kind || m.kind === kind).map((m) => `${m.kind} ${m.channel} ${m.send_at.toISOString()}`);
    },
    smsTo: (phone: string) => t.sms.messages.filter((m) => m.to === phone),
  };
}
