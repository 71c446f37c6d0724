import type { Kysely } from 'kysely';
import type pg from 'pg';
import type { Config } from './config';
import type { Database } from './db/schema';
import type { RouteTable } from './lib/api-route';
import type { Mailer } from './mail/mailer';
import type { SmtpFake } from './fakes/smtp-fake';
import type { SmsFake } from './fakes/sms-fake';
import type { SmsSender } from './sms/sms-sender';
import type { Payments } from './payments/payments';
import type { PaymentsFake } from './fakes/payments-fake';
import type { JobQueue } from './jobs/job-queue';
import type { Storage } from './storage/storage';
import type { ReadCache } from './lib/read-cache';
import type { LiveHub } from './features/live-events';

/** What feature routes are given; built once in createApp. */
export interface AppDeps {
  table: RouteTable;
  db: Kysely<Database>;
  pool: pg.Pool;
  config: Config;
  mailer: Mailer;
  sms: SmsSender;
  payments: Payments;
  jobs: JobQueue;
  /** Present when hosted services are replaced by local fakes (demo, dev, test). */
  smtpFake: SmtpFake | null;
  smsFake: SmsFake | null;
  paymentsFake: PaymentsFake | null;
  /** Uploaded photos; on disk under config.uploadsDir unless a caller passes another. */
  storage: Storage;
  /** Calendar reads and free times, serialised, per salon book version (one per app server). */
  readCache: ReadCache;
  /** This app server's open live streams and its one LISTEN connection. */
  liveHub: LiveHub;
}
