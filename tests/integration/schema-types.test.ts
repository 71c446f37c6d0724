import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestDb, type TestDb } from '../setup/test-db';
import { typedColumns, type TypedColumn } from './schema-types/typed-columns';

// Tables Kysely's Migrator keeps for itself; no repository reads them, so `Database` does not name them.
const UNTYPED_TABLES = new Set(['kysely_migration', 'kysely_migration_lock']);

interface DbColumn {
  table: string;
  column: string;
  nullable: boolean;
}

let t: TestDb;
let typed: TypedColumn[];

beforeAll(async () => {
  t = await createTestDb();
  typed = typedColumns();
});
afterAll(() => t.drop());

/** The migrated database's own account of its tables (PostgreSQL manual, "information_schema.columns"). */
async function databaseColumns(): Promise<DbColumn[]> {
  const { rows } = await t.pool.query<{ table_name: string; column_name: string; is_nullable: 'YES' | 'NO' }>(
    `select c.table_name, c.column_name, c.is_nullable
       from information_schema.columns c
       join information_schema.tables t on t.table_schema = c.table_schema and t.table_name = c.table_name
      where c.table_schema = 'public' and t.table_type = 'BASE TABLE'`,
  );
  return rows.filter((r) => !UNTYPED_TABLES.has(r.table_name)).map((r) => ({ table: r.table_name, column: r.column_name, nullable: r.is_nullable === 'YES' }));
}

/** Every way the two accounts differ, one line each, sorted so a failure reads as a list. */
function differences(db: DbColumn[], ts: TypedColumn[]): string[] {
  const key = (c: { table: string; column: string }) => `${c.table}.${c.column}`;
  const dbTables = new Set(db.map((c) => c.table));
  const tsTables = new Set(ts.map((c) => c.table));
  const dbByKey = new Map(db.map((c) => [key(c), c]));
  const tsByKey = new Map(ts.map((c) => [key(c), c]));
  const found: string[] = [];
  for (const table of dbTables) if (!tsTables.has(table)) found.push(`table ${table}: in the database, missing from Database`);
  for (const table of tsTables) if (!dbTables.has(table)) found.push(`table ${table}: in Database, missing from the database`);
  for (const c of db) if (tsTables.has(c.table) && !tsByKey.has(key(c))) found.push(`${key(c)}: in the database, missing from schema.ts`);
  for (const c of ts) {
    const inDb = dbByKey.get(key(c));
    if (!inDb) {
      if (dbTables.has(c.table)) found.push(`${key(c)}: in schema.ts, missing from the database`);
    } else if (c.nullable !== null && c.nullable !== inDb.nullable) {
      found.push(`${key(c)}: the database ${inDb.nullable ? 'allows' : 'refuses'} null, schema.ts ${c.nullable ? 'allows' : 'refuses'} it`);
    }
  }
  return found.sort();
}

describe('server/db/schema.ts matches the migrated database', () => {
  it('names every table and column the migrations create, and no other, with the same nullability', async () => {
    const db = await databaseColumns();
    expect(db.length).toBeGreaterThan(0);
    expect(differences(db, typed)).toEqual([]);
  });

  it('notices a column or table a migration adds, a column it drops and a change of nullability', async () => {
    // Done by hand here, in this file's own throwaway copy, to show the check above would fail on each.
    await t.pool.query(`alter table chairs add column shade text`);
    await t.pool.query(`alter table standby_entries drop column notes`);
    await t.pool.query(`alter table users alter column phone set not null`);
    await t.pool.query(`create table loose_ends (id int)`);
    expect(differences(await databaseColumns(), typed)).toEqual([
      'chairs.shade: in the database, missing from schema.ts',
      'standby_entries.notes: in schema.ts, missing from the database',
      'table loose_ends: in the database, missing from Database',
      'users.phone: the database refuses null, schema.ts allows it',
    ]);
  });
});
