import { promises as fs } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { FileMigrationProvider, Migrator, type Kysely } from 'kysely';

const migrationFolder = path.join(path.dirname(fileURLToPath(import.meta.url)), '..', '..', 'migrations');

/** Brings the schema to the newest migration; throws with the failing migration's name. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- Kysely's Migrator takes a database of any schema
export async function migrateToLatest(db: Kysely<any>): Promise<string[]> {
  const migrator = new Migrator({ db, provider: new FileMigrationProvider({ fs, path, migrationFolder }) });
  const { error, results } = await migrator.migrateToLatest();
  const failed = results?.find((r) => r.status === 'Error');
  if (error || failed) {
    throw new Error(`migration ${failed?.migrationName ?? ''} failed: ${String((error as Error)?.message ?? error)}`);
  }
  return (results ?? []).map((r) => r.migrationName);
}
