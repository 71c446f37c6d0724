import type { Db } from '@server/db/database';
import { pingDatabase } from './health.repository';

export interface Health {
  ok: boolean;
  db: 'up' | 'down';
}

/** Whether the app can serve: it is running, so that is whether its database answers. */
export async function checkHealth(db: Db): Promise<Health> {
  try {
    await pingDatabase(db);
    return { ok: true, db: 'up' };
  } catch {
    return { ok: false, db: 'down' };
  }
}
