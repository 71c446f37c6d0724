import PgBoss from 'pg-boss';

export type JobHandler = (data: Record<string, unknown>) => Promise<void>;

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
}

/**
 * Background work in PostgreSQL through pg-boss: it survives restarts and several app servers share it.
 * Handlers must be idempotent: a job may run again after a crash.
 */
export async function startJobQueue(databaseUrl: string, jobs: JobDefinition[]): Promise<JobQueue> {
  const boss = new PgBoss({ connectionString: databaseUrl, schema: 'pgboss', migrate: false, max: 4 });
  boss.on('error', (err) => console.error('job queue:', err.message));
  await boss.start();
  for (const job of jobs) {
    await boss.createQueue(job.name);
    await boss.work<Record<string, unknown>>(job.name, { pollingIntervalSeconds: 1 }, async (batch) => {
      for (const item of batch) await job.handler(item.data ?? {});
    });
    if (job.everyMinute) await boss.schedule(job.name, '* * * * *', {});
  }
  return {
    async schedule(name, data, at) {
      await boss.send(name, data, { startAfter: at });
    },
    stop: () => boss.stop({ graceful: true, timeout: 5_000 }),
  };
}
