import { Kysely, PostgresDialect, type Transaction } from 'kysely';
import pg from 'pg';
import type { Database } from './schema';

/** Repositories take `db` first: either the pool-backed Kysely or a transaction. */
export type Db = Kysely<Database> | Transaction<Database>;

export function createPool(connectionString: string): pg.Pool {
  const pool = new pg.Pool({ connectionString, max: 10, connectionTimeoutMillis: 5_000 });
  // An idle client that loses its server (PostgreSQL restarted) must not crash the app.
  pool.on('error', () => {});
  return pool;
}

export function createDb(pool: pg.Pool): Kysely<Database> {
  return new Kysely<Database>({ dialect: new PostgresDialect({ pool }) });
}
