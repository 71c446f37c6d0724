import type { Kysely } from 'kysely';
import type { Database } from '../db/schema';
import type { JobDefinition } from './job-queue';
import { LAPSE_HOLD_JOB } from '../features/online-booking/holds.service';
import { lapseHolds } from '../features/online-booking/holds.repository';

/** Every background job the app runs. Each is idempotent: running it twice changes nothing more. */
export function appJobs(db: Kysely<Database>): JobDefinition[] {
  return [
    // A hold lapses at its own time; the sweep every minute catches any whose job was lost.
    { name: LAPSE_HOLD_JOB, handler: async (data) => void (await lapseHolds(db, new Date(), String(data.bookingId))) },
    { name: 'lapse-holds-sweep', handler: async () => void (await lapseHolds(db, new Date())), everyMinute: true },
  ];
}
