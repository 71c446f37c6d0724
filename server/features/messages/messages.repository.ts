import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import type { MessageAttachment, MessageChannelChoice, MessageStatus } from '@server/db/schema';
import type { BookingContext } from './templates';

export interface BookingForMessages {
  context: BookingContext;
  salonId: string;
  clientId: string | null;
  status: string;
  version: number;
  email: string | null;
  phone: string | null;
  /** The client's choice; SMS is also off after an inbound STOP. */
  channel: MessageChannelChoice;
  smsStopped: boolean;
  marketingOptIn: boolean;
  serviceId: string;
  offsets: number[];
  quietFrom: string;
  quietTo: string;
  /** What the skin-test rule reads: the booking's own plan and the service's box, with the salon's rule. */
  skinTestRule: { plan: StepPlan; serviceAsks: boolean; validityDays: number; families: string[] };
}

/** Everything a booking's messages need, in one read (inside the caller's transaction). */
export async function bookingForMessages(db: Db, bookingId: string): Promise<BookingForMessages | null> {
  const row = await db
    .selectFrom('bookings as b')
    .innerJoin('salons as s', 's.id', 'b.salon_id')
    .innerJoin('services as sv', 'sv.id', 'b.service_id')
    .innerJoin('staff as st', 'st.id', 'b.stylist_id')
    .leftJoin('clients as c', 'c.id', 'b.client_id')
    .select([
      'b.id',
      'b.salon_id',
      'b.client_id',
      'b.status',
      'b.version',
      's.name as salonName',
      's.address',
      's.time_zone',
      's.reminder_offsets_hours',
      's.quiet_from',
      's.quiet_to',
      'sv.id as serviceId',
      'sv.name as serviceName',
      'sv.category',
      'st.display_name',
      'c.name as clientName',
      'c.email',
      'c.phone',
      'c.message_channel',
      'c.sms_stopped_at',
      'c.marketing_opt_in',
      's.skin_test_lead_hours',
      's.skin_test_validity_days',
      's.skin_test_families',
      'b.step_plan',
      'sv.needs_skin_test',
    ])
    .where('b.id', '=', bookingId)
    .executeTakeFirst();
  if (!row) return null;
  const sittings = await db
    .selectFrom('sittings')
    .select(['seq', sql<Date>`lower(during)`.as('start'), sql<Date>`upper(during)`.as('end')])
    .where('booking_id', '=', bookingId)
    .orderBy('seq')
    .execute();
  return {
    salonId: row.salon_id,
    clientId: row.client_id,
    status: row.status,
    version: row.version,
    email: row.email,
    phone: row.phone,
    channel: row.message_channel ?? 'both',
    smsStopped: row.sms_stopped_at !== null,
    marketingOptIn: row.marketing_opt_in ?? false,
    serviceId: row.serviceId,
    offsets: row.reminder_offsets_hours,
    quietFrom: row.quiet_from,
    quietTo: row.quiet_to,
    skinTestRule: {
      plan: row.step_plan as StepPlan,
      serviceAsks: row.needs_skin_test,
      validityDays: row.skin_test_validity_days,
      families: row.skin_test_families,
    },
    context: {
      bookingId,
      salonName: row.salonName,
      address: row.address,
      timeZone: row.time_zone,
      clientName: row.clientName ?? '',
      serviceName: row.serviceName,
      category: row.category,
      stylistName: row.display_name,
      sittings,
      skinTestLeadHours: row.skin_test_lead_hours,
    },
  };
}

/** Queued messages to a client on channels they no longer want (preferences changed, or STOP). */
export async function dropQueuedForClient(db: Db, clientId: string, channels: ('sms' | 'email')[]): Promise<void> {
  if (channels.length === 0) return;
  await db
    .updateTable('messages')
    .set({ status: 'dropped' })
    .where('client_id', '=', clientId)
    .where('status', '=', 'queued')
    .where('channel', 'in', channels)
    .execute();
}

/** The client's bookings that still have sittings ahead (for re-planning after a preference change). */
export async function upcomingBookingIds(db: Db, clientId: string, now: Date): Promise<string[]> {
  const rows = await db
    .selectFrom('bookings as b')
    .select('b.id')
    .where('b.client_id', '=', clientId)
    .where('b.status', 'in', ['booked', 'checked_in'])
    .where((eb) =>
      eb.exists(
        eb
          .selectFrom('sittings as s')
          .select('s.seq')
          .whereRef('s.booking_id', '=', 'b.id')
          .where(sql<boolean>`upper(s.during) > ${now}`),
      ),
    )
    .execute();
  return rows.map((r) => r.id);
}

/** Queued messages planned for an older version of the booking (or all, when `all`) will never go out. */
export async function dropQueued(db: Db, bookingId: string, currentVersion: number, all: boolean): Promise<void> {
  let q = db.updateTable('messages').set({ status: 'dropped' }).where('booking_id', '=', bookingId).where('status', '=', 'queued');
  if (!all) q = q.where('booking_version', '<', currentVersion);
  await q.execute();
}

export interface MessageListItem {
  id: string;
  kind: string;
  channel: 'sms' | 'email';
  toAddress: string;
  subject: string;
  body: string;
  sendAt: Date;
  status: MessageStatus;
  attempts: number;
  lastError: string | null;
  sentAt: Date | null;
  bookingId: string | null;
}

/** The salon's send log for the Outbox: the most recently planned first (what just happened is on top). */
export async function listMessages(db: Db, salonId: string, status: MessageStatus | undefined, limit = 200): Promise<MessageListItem[]> {
  let q = db
    .selectFrom('messages')
    .select([
      'id',
      'kind',
      'channel',
      'to_address as toAddress',
      'subject',
      'body',
      'send_at as sendAt',
      'status',
      'attempts',
      'last_error as lastError',
      'sent_at as sentAt',
      'booking_id as bookingId',
    ])
    .where('salon_id', '=', salonId);
  if (status) q = q.where('status', '=', status);
  return q.orderBy('created_at', 'desc').orderBy('send_at', 'desc').limit(limit).execute();
}

/** The client's follow-up suggestions still queued, with their bookings. */
export async function queuedFollowUps(db: Db, clientId: string): Promise<{ bookingId: string }[]> {
  const rows = await db
    .selectFrom('messages')
    .select('booking_id')
    .where('client_id', '=', clientId)
    .where('kind', '=', 'follow_up')
    .where('status', '=', 'queued')
    .execute();
  return rows.filter((r) => r.booking_id !== null).map((r) => ({ bookingId: r.booking_id! }));
}

export async function dropFollowUps(db: Db, bookingId: string): Promise<void> {
  await db
    .updateTable('messages')
    .set({ status: 'dropped' })
    .where('booking_id', '=', bookingId)
    .where('kind', '=', 'follow_up')
    .where('status', '=', 'queued')
    .execute();
}

/** The first message of a booking (confirmation or skin-test notice) on each channel it was planned for, newest plan first. */
export async function firstMessageSends(db: Db, bookingId: string) {
  return db
    .selectFrom('messages')
    .select(['channel', 'status', 'send_at as sendAt', 'sent_at as sentAt'])
    .where('booking_id', '=', bookingId)
    .where('kind', 'in', ['confirmation', 'skin_test_booked'])
    .where('status', '!=', 'dropped')
    .orderBy('created_at', 'desc')
    .execute();
}

/** The salon's quiet hours for texts, `HH:MM`; equal ends mean none. */
export async function salonQuietHours(db: Db, salonId: string): Promise<{ from: string; to: string }> {
  const row = await db.selectFrom('salons').select(['quiet_from', 'quiet_to']).where('id', '=', salonId).executeTakeFirstOrThrow();
  return { from: row.quiet_from.slice(0, 5), to: row.quiet_to.slice(0, 5) };
}

/** A message to add to the send log; the dedupe key makes planning it twice harmless. */
export interface NewMessage {
  salonId: string;
  bookingId?: string | null;
  /** The booking's version it was planned for; a move drops what older versions queued. */
  bookingVersion?: number | null;
  clientId?: string | null;
  kind: string;
  channel: 'sms' | 'email';
  toAddress: string;
  subject?: string;
  body: string;
  attachments?: MessageAttachment[];
  sendAt: Date;
  dedupeKey: string;
}

export interface PlannedMessage {
  id: string;
  sendAt: Date;
}

/**
 * Inserts what is not planned yet (the dedupe key decides) and returns what is newly queued. A row with the
 * same key that was dropped for the client's preferences (same booking version) is queued again with the
 * current text and address; sent, failed and queued rows are left alone, so nothing goes out twice.
 */
export async function insertPlanned(db: Db, messages: NewMessage[]): Promise<PlannedMessage[]> {
  if (messages.length === 0) return [];
  return db
    .insertInto('messages')
    .values(
      messages.map((m) => ({
        salon_id: m.salonId,
        booking_id: m.bookingId,
        booking_version: m.bookingVersion,
        client_id: m.clientId,
        kind: m.kind,
        channel: m.channel,
        to_address: m.toAddress,
        subject: m.subject,
        body: m.body,
        attachments: m.attachments && JSON.stringify(m.attachments),
        send_at: m.sendAt,
        dedupe_key: m.dedupeKey,
      })),
    )
    .onConflict((oc) =>
      oc
        .column('dedupe_key')
        .doUpdateSet((eb) => ({
          status: 'queued',
          to_address: eb.ref('excluded.to_address'),
          body: eb.ref('excluded.body'),
          subject: eb.ref('excluded.subject'),
          send_at: eb.ref('excluded.send_at'),
          attempts: 0,
          last_error: null,
        }))
        .where('messages.status', '=', 'dropped'),
    )
    .returning(['id', 'send_at as sendAt'])
    .execute();
}

/** A move makes what was planned for the booking's old times stale: its version (in every dedupe key) goes up. */
export async function bumpBookingVersion(db: Db, bookingId: string): Promise<void> {
  await db
    .updateTable('bookings')
    .set((eb) => ({ version: eb('version', '+', 1) }))
    .where('id', '=', bookingId)
    .execute();
}

/** How a client can be reached, as their messages are planned. */
export interface ClientReach {
  email: string | null;
  phone: string | null;
  messageChannel: MessageChannelChoice;
  smsStoppedAt: Date | null;
}

export async function findClientReach(db: Db, clientId: string): Promise<ClientReach | undefined> {
  return db
    .selectFrom('clients')
    .select(['email', 'phone', 'message_channel as messageChannel', 'sms_stopped_at as smsStoppedAt'])
    .where('id', '=', clientId)
    .executeTakeFirst();
}

/** The client's queued messages on a channel go to their current address. */
export async function readdressQueued(db: Db, clientId: string, channel: 'sms' | 'email', address: string): Promise<void> {
  await db
    .updateTable('messages')
    .set({ to_address: address })
    .where('client_id', '=', clientId)
    .where('status', '=', 'queued')
    .where('channel', '=', channel)
    .execute();
}

/** Drops the client's queued booking messages except the given kinds (re-planning revives what still holds). */
export async function dropQueuedBookingMessages(db: Db, clientId: string, exceptKinds: string[]): Promise<void> {
  await db
    .updateTable('messages')
    .set({ status: 'dropped' })
    .where('client_id', '=', clientId)
    .where('status', '=', 'queued')
    .where('booking_id', 'is not', null)
    .where('kind', 'not in', exceptKinds)
    .execute();
}
