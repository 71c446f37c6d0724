import type { Kysely } from 'kysely';
import type { Database } from '../db/schema';
import type { JobDefinition } from './job-queue';
import { LAPSE_HOLD_JOB } from '../features/online-booking/holds.service';
import { lapseHolds } from '../features/online-booking/holds.repository';
import {
  REQUEUE_STUCK_MESSAGES_JOB,
  SCHEDULE_MESSAGE_JOBS_JOB,
  SEND_DUE_MESSAGES_JOB,
  SEND_MESSAGE_JOB,
  requeueStuckMessages,
  scheduleMessageJobs,
  sendDueMessages,
  sendOnTime,
  type Senders,
} from '../features/messages/send-message.job';
import { planStaffMessages } from '../features/messages/staff-messages.service';
import { pruneSignInAttempts } from '../features/session/sign-in-attempts.repository';
import { ACCOUNT_LOOKBACK_DAYS, SIGN_IN_LIMITS } from '../features/session/sign-in-limits';
import { pruneRateLimits } from '../lib/rate-limits.repository';
import { closeStaleCheckouts, makePendingRefunds, releaseUnpaidDeposits } from '../features/payments';
import type { Payments } from '../payments/payments';

export interface JobOptions {
  /** Seconds after which a claim with no provider reference is taken for a dead worker's. */
  claimTimeoutSeconds?: number;
}

/** Every background job the app runs. Each is idempotent: running it twice changes nothing more. */
export function appJobs(db: Kysely<Database>, services: Senders & { payments: Payments }, options: JobOptions = {}): JobDefinition[] {
  const senders: Senders = services;
  return [
    // A hold lapses at its own time; the sweep every minute catches any whose job was lost.
    { name: LAPSE_HOLD_JOB, handler: async (data) => void (await lapseHolds(db, new Date(), String(data.bookingId))) },
    { name: 'lapse-holds-sweep', handler: async () => void (await lapseHolds(db, new Date())), everyMinute: true },
    // The send log is the schedule. Each message due soon gets a job at its exact instant; every minute a
    // sweep also sends whatever is due, in order (the safety net). The claim makes every re-run harmless.
    { name: SEND_MESSAGE_JOB, handler: async (data) => void (await sendOnTime(db, senders, String(data.messageId), new Date())) },
    {
      name: SCHEDULE_MESSAGE_JOBS_JOB,
      handler: async (_data, queue) => void (await scheduleMessageJobs(db, (id, at) => queue.schedule(SEND_MESSAGE_JOB, { messageId: id }, at), new Date())),
      everyMinute: true,
      atStart: true,
    },
    { name: SEND_DUE_MESSAGES_JOB, handler: async () => void (await sendDueMessages(db, senders, new Date())), everyMinute: true, atStart: true },
    // A restarted worker first frees claims a dead worker left, then the sweep above sends them.
    {
      name: REQUEUE_STUCK_MESSAGES_JOB,
      handler: async () => {
        if ((await requeueStuckMessages(db, new Date(), options.claimTimeoutSeconds)) > 0) await sendDueMessages(db, senders, new Date());
      },
      everyMinute: true,
      atStart: true,
    },
    // Stylists' next-day lists and the desk's no-deposit list, at 18:00 in each salon's zone.
    { name: 'plan-staff-messages', handler: async () => void (await planStaffMessages(db, new Date())), everyMinute: true },
    // Request counts whose window ended, and sign-in attempts older than any limit reads.
    {
      name: 'prune-limits',
      handler: async () => {
        await pruneRateLimits(db);
        await pruneSignInAttempts(db, ACCOUNT_LOOKBACK_DAYS, SIGN_IN_LIMITS.knownAddressDays);
      },
      everyMinute: true,
    },
    // Money: refunds decided but not made yet (the provider was down) are asked for again under the same key; desk
    // bookings whose deposit is unpaid at their release time are released; payment pages nobody should pay are closed.
    { name: 'make-pending-refunds', handler: async () => void (await makePendingRefunds(db, services.payments)), everyMinute: true, atStart: true },
    { name: 'release-unpaid-deposits', handler: async () => void (await releaseUnpaidDeposits(db, new Date())), everyMinute: true },
    { name: 'close-stale-checkouts', handler: async () => void (await closeStaleCheckouts(db, services.payments)), everyMinute: true },
  ];
}
