import PgBoss from 'pg-boss';
import { logger } from '../lib/logger';

/** A job's work; `queue` lets it queue further jobs (e.g. one per message at its exact instant). */
export type JobHandler = (data: Record<string, unknown>, queue: JobQueue) => Promise<void>;

export interface JobQueue {
  /** Runs `name` with `data` once, not before `at`. */
  schedule(name: string, data: Record<string, unknown>, at: Date): Promise<void>;
  stop(): Promise<void>;
}

export interface JobDefinition {
  name: string;
  handler: JobHandler;
  /** Also run every minute (cron), to catch anything a scheduled run missed. */
  everyMinute?: boolean;
  /** Also run once when the queue starts (a restarted worker catches up at once, not at the next minute). */
  atStart?: boolean;
}

/**
 * Background work in PostgreSQL through pg-boss: it survives restarts and several app servers share it.
 * Handlers must be idempotent: a job may run again after a crash.
 */
export async function startJobQueue(databaseUrl: string, jobs: JobDefinition[]): Promise<JobQueue> {
  const boss = new PgBoss({ connectionString: databaseUrl, schema: 'pgboss', migrate: false, max: 4 });
  boss.on('error', (err) => logger.error({ err }, 'job queue error'));
  await boss.start();
  const queue: JobQueue = {
    async schedule(name, data, at) {
      await boss.send(name, data, { startAfter: at });
    },
    stop: () => boss.stop({ graceful: true, timeout: 5_000 }),
  };
  for (const job of jobs) {
    await boss.createQueue(job.name);
    await boss.work<Record<string, unknown>>(job.name, { pollingIntervalSeconds: 1 }, async (batch) => {
      for (const item of batch) {
        // Each run's lines carry the job's name and id (pg-boss retries a failed one under the same id).
        const log = logger.child({ job: job.name, jobId: item.id });
        const started = Date.now();
        try {
          await job.handler(item.data ?? {}, queue);
          log.debug({ ms: Date.now() - started }, 'job done');
        } catch (err) {
          log.error({ err, ms: Date.now() - started }, 'job failed');
          throw err;
        }
      }
    });
    if (job.everyMinute) await boss.schedule(job.name, '* * * * *', {});
    if (job.atStart) await boss.send(job.name, {});
  }
  return queue;
}
