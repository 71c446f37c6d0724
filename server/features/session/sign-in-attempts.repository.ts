import { sql } from 'kysely';
import type { Db } from '@server/db/database';

/**
 * Serialises sign-in checks for one account and for one network address until the transaction ends, so that
 * counting the failures and recording the attempt are one step: concurrent guesses queue here and each sees
 * the ones before it. Account locks are taken before address locks (no deadlock).
 */
export async function lockSignIn(db: Db, email: string, ip: string): Promise<void> {
  await sql`select pg_advisory_xact_lock(hashtextextended(${`sign-in:account:${email.toLowerCase()}`}, 0))`.execute(db);
  await sql`select pg_advisory_xact_lock(hashtextextended(${`sign-in:address:${ip}`}, 0))`.execute(db);
}

export interface SignInHistory {
  /** The database's clock, which wrote every attempt's time (app servers' clocks may differ a little). */
  now: Date;
  /** This address has signed in to this account before (within `knownDays`): its attempts are counted apart. */
  knownAddress: boolean;
  /** When this account's failed (or still unanswered) attempts happened in the last `days`, newest first: from this
   * address if it is a known one, else from every address the account has not signed in from. */
  accountFailures: Date[];
  /** Failed attempts from this address, whatever the account, in the last `addressMinutes`. */
  addressFailures: number;
}

/** What the sign-in limits are decided on (read while lockSignIn is held). */
export async function signInHistory(
  db: Db,
  email: string,
  ip: string,
  opts: { knownDays: number; days: number; addressMinutes: number },
): Promise<SignInHistory> {
  const account = email.toLowerCase();
  const known = sql<boolean>`exists (select 1 from sign_in_attempts k
    where k.email = ${account} and k.ip = sign_in_attempts.ip and k.succeeded and k.at > now() - make_interval(days => ${opts.knownDays}))`;
  const knownRow = await db
    .selectFrom('sign_in_attempts')
    .select('id')
    .where('email', '=', account)
    .where('ip', '=', ip)
    .where('succeeded', '=', true)
    .where(sql<boolean>`at > now() - make_interval(days => ${opts.knownDays})`)
    .executeTakeFirst();
  const failures = await db
    .selectFrom('sign_in_attempts')
    .select(['at', 'ip', known.as('fromKnown')])
    .where('email', '=', account)
    .where('succeeded', '=', false)
    .where(sql<boolean>`at > now() - make_interval(days => ${opts.days})`)
    .orderBy('at', 'desc')
    .execute();
  const address = await db
    .selectFrom('sign_in_attempts')
    .select(sql<number>`count(*)::int`.as('n'))
    .where('ip', '=', ip)
    .where('succeeded', '=', false)
    .where(sql<boolean>`at > now() - make_interval(mins => ${opts.addressMinutes})`)
    .executeTakeFirstOrThrow();
  const { now } = await sql<{ now: Date }>`select now() as now`.execute(db).then((r) => r.rows[0] ?? { now: new Date() });
  const knownAddress = knownRow !== undefined;
  const counted = failures.filter((f) => (knownAddress ? f.ip === ip : !f.fromKnown));
  return { now, knownAddress, accountFailures: counted.map((f) => f.at), addressFailures: address.n };
}

/** Records an attempt about to be checked; it counts as a failure until markSucceeded. Answers its id. */
export async function recordAttempt(db: Db, email: string, ip: string): Promise<string> {
  const row = await db.insertInto('sign_in_attempts').values({ email: email.toLowerCase(), ip, succeeded: false }).returning('id').executeTakeFirstOrThrow();
  return String(row.id);
}

export async function markSucceeded(db: Db, id: string): Promise<void> {
  await db.updateTable('sign_in_attempts').set({ succeeded: true }).where('id', '=', id).execute();
}

/** Forgets failures older than `failureDays` and successes older than `successDays` (what the limits still read). */
export async function pruneSignInAttempts(db: Db, failureDays: number, successDays: number): Promise<void> {
  await db
    .deleteFrom('sign_in_attempts')
    .where((eb) =>
      eb.or([
        eb.and([eb('succeeded', '=', false), eb('at', '<', sql<Date>`now() - make_interval(days => ${failureDays})`)]),
        eb('at', '<', sql<Date>`now() - make_interval(days => ${successDays})`),
      ]),
    )
    .execute();
}
