import type { Kysely } from 'kysely';
import type { Database } from '../db/schema';
import type { JobDefinition } from './job-queue';
import { LAPSE_HOLD_JOB } from '../features/online-booking/holds.service';
import { lapseHolds } from '../features/online-booking/holds.repository';
import {
  REQUEUE_STUCK_MESSAGES_JOB, SEND_DUE_MESSAGES_JOB, SEND_MESSAGE_JOB, requeueStuckMessages, sendDueMessages, sendMessage, type Senders,
} from '../features/messages/send-message.job';

/** Every background job the app runs. Each is idempotent: running it twice changes nothing more. */
export function appJobs(db: Kysely<Database>, senders: Senders): JobDefinition[] {
  return [
    // A hold lapses at its own time; the sweep every minute catches any whose job was lost.
    { name: LAPSE_HOLD_JOB, handler: async (data) => void (await lapseHolds(db, new Date(), String(data.bookingId))) },
    { name: 'lapse-holds-sweep', handler: async () => void (await lapseHolds(db, new Date())), everyMinute: true },
    // The send log is the schedule: every minute, due messages go out in order; the claim makes re-runs harmless.
    { name: SEND_MESSAGE_JOB, handler: async (data) => void (await sendMessage(db, senders, String(data.messageId), new Date())) },
    { name: SEND_DUE_MESSAGES_JOB, handler: async () => void (await sendDueMessages(db, senders, new Date())), everyMinute: true },
    { name: REQUEUE_STUCK_MESSAGES_JOB, handler: async () => void (await requeueStuckMessages(db, new Date())), everyMinute: true },
  ];
}
