import type { Db } from '@server/db/database';
import { formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { findClientReach, insertPlanned, salonQuietHours, type ClientReach } from './messages.repository';
import { outOfQuietHours } from './quiet-hours';
import { recordRunningLate } from './running-late.repository';
import { firstName } from './templates';

/** A later client to tell that the day runs late. */
export interface RunningLate {
  salon: { id: string; name: string; timeZone: string };
  bookingId: string;
  sittingId: string;
  clientId: string | null;
  clientName: string;
  minutesLate: number;
  /** When the client's sitting now starts: the booked start plus the delay. */
  newStart: Date;
  byUserId: string | null;
}

export type RunningLateOutcome = { sent: true; channel: 'sms' | 'email' } | { sent: false; why: 'already_told' | 'unreachable' };

/**
 * The one channel a delay notice goes on: a text when the client takes texts and it can go now (not stopped, outside
 * the salon's quiet hours), as a same-day notice is read soonest there; otherwise an e-mail when they take e-mail.
 * A notice that could only go after the new start is no use, so none is planned then.
 */
function channelFor(c: ClientReach, quiet: { from: string; to: string }, zone: string, now: Date): { channel: 'sms' | 'email'; to: string } | null {
  const textNow = outOfQuietHours(now, zone, quiet.from, quiet.to).getTime() === now.getTime();
  if (c.phone && c.messageChannel !== 'email' && !c.smsStoppedAt && textNow) return { channel: 'sms', to: c.phone };
  if (c.email && c.messageChannel !== 'sms') return { channel: 'email', to: c.email };
  return null;
}

/**
 * Tells the client "running about 20 minutes late — see you at 3:20" through the send log, once per sitting and
 * delay: the database's key on (sitting, minutes) refuses a second notice, whoever asks (inside the caller's
 * transaction, so a refused change tells nobody). Nothing is recorded when the client cannot be reached now.
 */
export async function tellRunningLate(db: Db, late: RunningLate, now: Date): Promise<RunningLateOutcome> {
  const reach = late.clientId ? await findClientReach(db, late.clientId) : undefined;
  const to = reach ? channelFor(reach, await salonQuietHours(db, late.salon.id), late.salon.timeZone, now) : null;
  if (!to) return { sent: false, why: 'unreachable' };
  if (!(await recordRunningLate(db, late.sittingId, late.minutesLate, now, late.byUserId))) return { sent: false, why: 'already_told' };
  const at = formatTime(late.newStart, formatFor(late.salon.timeZone));
  const line = `we're running about ${late.minutesLate} minutes late — see you at ${at}.`;
  await insertPlanned(db, [
    {
      salonId: late.salon.id,
      bookingId: late.bookingId,
      clientId: late.clientId,
      kind: 'running_late',
      channel: to.channel,
      toAddress: to.to,
      subject: `Running about ${late.minutesLate} minutes late — see you at ${at}`,
      body:
        to.channel === 'sms'
          ? `${late.salon.name}: ${line} Sorry to keep you waiting.`
          : `Hello ${firstName(late.clientName)},\n\nThe salon is running late: ${line}\nSorry to keep you waiting.\n\n${late.salon.name}\n`,
      sendAt: now,
      dedupeKey: `running_late:${late.sittingId}:${late.minutesLate}`,
    },
  ]);
  return { sent: true, channel: to.channel };
}
