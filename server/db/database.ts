import { Kysely, PostgresDialect, type Transaction } from 'kysely';
import pg from 'pg';
import type { Database } from './schema';

/** Repositories take `db` first: either the pool-backed Kysely or a transaction. */
export type Db = Kysely<Database> | Transaction<Database>;

export function createPool(connectionString: string): pg.Pool {
  // Time limits turn a stuck lock or a forgotten transaction into an error instead of a request that never ends.
  const pool = new pg.Pool({
    connectionString,
    max: 10,
    connectionTimeoutMillis: 5_000,
    statement_timeout: 30_000,
    lock_timeout: 10_000,
    idle_in_transaction_session_timeout: 60_000,
  });
  // An idle client that loses its server (PostgreSQL restarted) must not crash the app.
  pool.on('error', () => {});
  return pool;
}

export function createDb(pool: pg.Pool): Kysely<Database> {
  return new Kysely<Database>({ dialect: new PostgresDialect({ pool }) });
}
