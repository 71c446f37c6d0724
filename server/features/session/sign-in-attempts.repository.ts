import { sql } from 'kysely';
import type { Db } from '@server/db/database';

export async function recordAttempt(db: Db, email: string, ip: string, succeeded: boolean): Promise<void> {
  await db.insertInto('sign_in_attempts').values({ email: email.toLowerCase(), ip, succeeded }).execute();
}

/** Failed attempts in the last `minutes` for this account and for this address. */
export async function recentFailures(db: Db, email: string, ip: string, minutes: number) {
  const row = await db
    .selectFrom('sign_in_attempts')
    .select([
      sql<number>`count(*) filter (where email = ${email.toLowerCase()})::int`.as('byEmail'),
      sql<number>`count(*) filter (where ip = ${ip})::int`.as('byIp'),
    ])
    .where('succeeded', '=', false)
    .where(sql<boolean>`at > now() - make_interval(mins => ${minutes})`)
    .where((eb) => eb.or([eb('email', '=', email.toLowerCase()), eb('ip', '=', ip)]))
    .executeTakeFirstOrThrow();
  return row;
}
