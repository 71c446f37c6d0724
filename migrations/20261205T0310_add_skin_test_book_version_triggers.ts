import { sql, type Kysely } from 'kysely';

// Booking views carry each booking's skin-test state (waiting on a test, or blocked by a reaction), read from the
// client's records: a recorded test, reading or clearance must renew the salon's cached reads like any change of
// the book (the book-version triggers of migrations/20261204T0900).
export async function up(db: Kysely<any>): Promise<void> {
  for (const table of ['skin_tests', 'skin_test_clearances']) {
    await sql`
      create constraint trigger ${sql.raw(`${table}_book_version`)}
      after insert or update or delete on ${sql.table(table)}
      deferrable initially deferred
      for each row execute function book_changed_by_salon()
    `.execute(db);
  }
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const table of ['skin_tests', 'skin_test_clearances']) {
    await sql`drop trigger ${sql.raw(`${table}_book_version`)} on ${sql.table(table)}`.execute(db);
  }
}
