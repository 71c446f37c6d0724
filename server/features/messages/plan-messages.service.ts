import { DateTime } from 'luxon';
import type { Db } from '@server/db/database';
import { followUpTimes } from '@shared/messages/follow-up-times';
import type { Salon } from '@shared/schemas/salon.schemas';
import { bookingSkinTestStates } from '../skin-tests';
import {
  bookingForMessages,
  bumpBookingVersion,
  dropFollowUps,
  dropQueued,
  dropQueuedBookingMessages,
  dropQueuedForClient,
  findClientReach,
  insertPlanned,
  queuedFollowUps,
  readdressQueued,
  upcomingBookingIds,
  type BookingForMessages,
  type NewMessage,
  type PlannedMessage,
} from './messages.repository';
import { followUpRulesForService } from './follow-up-rules.repository';
import { outOfQuietHours, reminderAt } from './quiet-hours';
import { aftercareKind, aftercareNotes } from './aftercare-notes';
import {
  aftercareMessage,
  bookingMessage,
  dayBeforeSittingMessage,
  followUpMessage,
  reminderMessage,
  skinTestBookedMessage,
  type BookingMessageKind,
  type MessageText,
} from './templates';

/**
 * Why the booking's messages are being planned again; 'preferences' adds missing reminders only; 'skin_test'
 * follows a change of the client's skin-test record (reminders held while the record blocks the colour);
 * 'moved_quietly' is a move the caller tells the client of in its own words (a late start), so no change notice.
 */
export type BookingChange = 'booked' | 'moved' | 'moved_quietly' | 'cancelled' | 'preferences' | 'skin_test';

const PLANNED_FOR = ['booked', 'checked_in', 'cancelled'];
/** The notice sent when a booking is made, moved or cancelled (sequence 0 in the dedupe key). */
const FIRST_KINDS = ['confirmation', 'skin_test_booked', 'change', 'cancellation'];
/** Salon wall-clock times (common practice: early evening for "see you tomorrow", mid-morning for aftercare). */
export const DAY_BEFORE_AT = { hour: 18, minute: 0 };
export const AFTERCARE_AT = { hour: 10, minute: 0 };

/**
 * Brings a booking's send log in line with the booking, inside the caller's transaction: a move bumps the
 * booking's version and drops what was queued for the old times; a cancellation drops everything queued.
 * New rows carry the version in their dedupe key, so planning twice inserts nothing twice. The rows are the
 * schedule: each is picked up once its send_at has come (see send-message.job.ts). Returns the new rows' ids
 * and times, so the caller can also queue a job at each exact instant.
 */
export async function replanBookingMessages(db: Db, bookingId: string, now: Date, change: BookingChange = 'booked'): Promise<PlannedMessage[]> {
  const moved = change === 'moved' || change === 'moved_quietly';
  if (moved) await bumpBookingVersion(db, bookingId);
  const b = await bookingForMessages(db, bookingId);
  if (!b) return [];
  const cancelled = b.status === 'cancelled';
  const skinTest = await skinTestOf(db, b, now);
  // While the client's record blocks the colour, nothing more goes out until the desk cancels or changes the plan.
  if (skinTest === 'blocked' && !cancelled) {
    await dropQueued(db, bookingId, b.version, true);
    return [];
  }
  const addOnly = change === 'preferences' || change === 'skin_test';
  if (!addOnly) await dropQueued(db, bookingId, b.version, cancelled);
  // A hold has no client yet and no-shows or finished bookings need nothing new.
  if (!b.clientId || !PLANNED_FOR.includes(b.status) || b.context.sittings.length === 0) return [];

  const rows: NewMessage[] = [];
  if (!addOnly && change !== 'moved_quietly') rows.push(...toRows(b, 0, firstKind(b, change), firstMessage(b, change, skinTest === 'waiting'), now, null));
  if (!cancelled) rows.push(...(await sittingMessages(db, b, now)));
  return insertPlanned(db, rows);
}

function firstKind(b: BookingForMessages, change: BookingChange): string {
  if (b.status === 'cancelled') return 'cancellation';
  if (change === 'moved') return 'change';
  return b.context.category === 'skin_test' ? 'skin_test_booked' : 'confirmation';
}

function firstMessage(b: BookingForMessages, change: BookingChange, waitingOnTest: boolean): MessageText {
  const kind = firstKind(b, change);
  if (kind === 'skin_test_booked') return skinTestBookedMessage(b.context);
  return bookingMessage(kind as BookingMessageKind, b.context, waitingOnTest);
}

/** The booking's skin-test footing, by the one rule (the salon's lead time, validity and tested families). */
const skinTestSalon = (b: BookingForMessages) => ({
  timeZone: b.context.timeZone,
  skinTestLeadHours: b.context.skinTestLeadHours,
  skinTestValidityDays: b.skinTestRule.validityDays,
  skinTestFamilies: b.skinTestRule.families as Salon['skinTestFamilies'],
});

async function skinTestOf(db: Db, b: BookingForMessages, now: Date) {
  const rule = b.skinTestRule;
  const states = await bookingSkinTestStates(
    db,
    skinTestSalon(b),
    [{ clientId: b.clientId, status: b.status, plan: rule.plan, serviceAsks: rule.serviceAsks, starts: b.context.sittings.map((s) => s.start) }],
    now,
  );
  return states[0]!.status; // one state per footing asked about
}

/** Reminders, "day n of m", aftercare and marketing follow-ups for every sitting still ahead. */
async function sittingMessages(db: Db, b: BookingForMessages, now: Date): Promise<NewMessage[]> {
  const zone = b.context.timeZone;
  const rows: NewMessage[] = [];
  for (const sitting of b.context.sittings) {
    if (sitting.start <= now) continue;
    for (const hours of b.offsets) {
      const at = reminderAt(sitting.start, hours, zone);
      if (at <= now) continue; // booked too late for this reminder: the confirmation covers it
      rows.push(...toRows(b, sitting.seq, `reminder_${hours}h`, reminderMessage(b.context, sitting.seq, hours), at, sitting.start));
    }
    if (sitting.seq > 1) {
      const at = DateTime.fromJSDate(sitting.start, { zone })
        .minus({ days: 1 })
        .set({ ...DAY_BEFORE_AT, second: 0, millisecond: 0 })
        .toJSDate();
      if (at > now && at < sitting.start)
        rows.push(...toRows(b, sitting.seq, 'day_before_sitting', dayBeforeSittingMessage(b.context, sitting.seq), at, sitting.start));
    }
  }
  const last = b.context.sittings.at(-1)!;
  const kind = aftercareKind(b.context.category, b.context.serviceName);
  if (kind && last.end > now) {
    const at = DateTime.fromJSDate(last.end, { zone })
      .plus({ days: 1 })
      .set({ ...AFTERCARE_AT, second: 0, millisecond: 0 })
      .toJSDate();
    rows.push(...toRows(b, last.seq, 'aftercare', aftercareMessage(b.context, aftercareNotes(kind)), at, null));
  }
  if (b.marketingOptIn && last.end > now) rows.push(...(await followUpRows(db, b, now)));
  return rows;
}

/** Follow-ups from the owner's rules for this service, anchored on the end of the last sitting. */
export async function followUpRows(db: Db, b: BookingForMessages, now: Date, ruleId?: string): Promise<NewMessage[]> {
  const rules = (await followUpRulesForService(db, b.serviceId)).filter((r) => !ruleId || r.id === ruleId);
  const anchor = b.context.sittings.at(-1)!.end;
  return rules.flatMap((rule) =>
    followUpTimes(rule.rrule, anchor, b.context.timeZone)
      .filter((at) => at > now)
      .flatMap((at, n) => toRows(b, `${rule.id}.${rule.version}.${n + 1}`, 'follow_up', followUpMessage(b.context, rule), at, null)),
  );
}

/** The channels a client's service messages go on: their choice, minus SMS after a STOP. */
function channelsFor(b: BookingForMessages): { email: string | null; sms: string | null } {
  return {
    email: b.channel !== 'sms' ? b.email : null,
    sms: b.channel !== 'email' && !b.smsStopped ? b.phone : null,
  };
}

/** One row per channel the client wants; SMS leaves quiet hours, and never after the sitting. */
function toRows(b: BookingForMessages, seq: number | string, kind: string, text: MessageText, at: Date, notAfter: Date | null): NewMessage[] {
  const base = { salonId: b.salonId, bookingId: b.context.bookingId, bookingVersion: b.version, clientId: b.clientId, kind };
  const key = (channel: string) => `${b.context.bookingId}:${seq}:${kind}:${channel}:v${b.version}`;
  const to = channelsFor(b);
  const rows: NewMessage[] = [];
  if (to.email) {
    rows.push({
      ...base,
      channel: 'email',
      toAddress: to.email,
      subject: text.subject,
      body: text.email,
      attachments: text.attachments,
      sendAt: at,
      dedupeKey: key('email'),
    });
  }
  if (to.sms) {
    const smsAt = outOfQuietHours(at, b.context.timeZone, b.quietFrom, b.quietTo);
    if (!notAfter || smsAt < notAfter) rows.push({ ...base, channel: 'sms', toAddress: to.sms, body: text.sms, sendAt: smsAt, dedupeKey: key('sms') });
  }
  return rows;
}

/**
 * After a client's preferences change (desk, their own page, or an inbound STOP/START): queued messages on
 * channels they no longer want are dropped, and reminders on newly wanted channels are planned for every
 * booking still ahead (confirmations already sent are not repeated).
 */
export async function replanClientMessages(db: Db, clientId: string, now: Date): Promise<PlannedMessage[]> {
  const client = await findClientReach(db, clientId);
  if (!client) return [];
  // Booking-change notices still queued keep going, on the channels still wanted and to the current address.
  const unwanted: ('sms' | 'email')[] = [];
  if (client.messageChannel === 'email' || client.smsStoppedAt || !client.phone) unwanted.push('sms');
  if (client.messageChannel === 'sms' || !client.email) unwanted.push('email');
  await dropQueuedForClient(db, clientId, unwanted);
  for (const [channel, address] of [
    ['sms', client.phone],
    ['email', client.email],
  ] as const) {
    if (address) await readdressQueued(db, clientId, channel, address);
  }
  // Everything else is planned afresh: dropped here, then re-planned (reviving rows whose key is unchanged).
  await dropQueuedBookingMessages(db, clientId, FIRST_KINDS);
  const planned: PlannedMessage[] = [];
  for (const id of await upcomingBookingIds(db, clientId, now)) planned.push(...(await replanBookingMessages(db, id, now, 'preferences')));
  return planned;
}

/**
 * After a client's skin-test record changed (a test recorded or read, a clearance): each upcoming booking's
 * reminders are held while the record blocks its colour, and planned again once it allows it.
 */
export async function replanAfterSkinTestChange(db: Db, clientId: string, now: Date): Promise<void> {
  for (const id of await upcomingBookingIds(db, clientId, now)) await replanBookingMessages(db, id, now, 'skin_test');
  await dropBlockedFollowUps(db, clientId, now);
}

/**
 * Follow-up suggestions ("time for your next colour") of past bookings whose steps need a skin test are dropped
 * while the client's record blocks such colour: nobody is invited to book what the rule refuses.
 */
async function dropBlockedFollowUps(db: Db, clientId: string, now: Date): Promise<void> {
  const queued = await queuedFollowUps(db, clientId);
  for (const bookingId of new Set(queued.map((q) => q.bookingId))) {
    const b = await bookingForMessages(db, bookingId);
    if (!b) continue;
    const states = await bookingSkinTestStates(
      db,
      skinTestSalon(b),
      [{ clientId, status: 'booked', plan: b.skinTestRule.plan, serviceAsks: b.skinTestRule.serviceAsks, starts: [now] }],
      now,
    );
    if (states[0]!.status === 'blocked') await dropFollowUps(db, bookingId);
  }
}
