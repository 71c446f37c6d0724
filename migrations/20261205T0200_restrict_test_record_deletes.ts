import { sql, type Kysely } from 'kysely';

// Skin and strand tests are safety records (a positive skin test blocks oxidative colour for good), so
// removing a client or a salon must not take them along: the delete is refused while tests exist
// (docs/records.md). They never referenced bookings; the recorder's account is `set null` and its name
// is kept on the row (20261205T0210). Restrict, not no action: the refusal happens at once, whichever
// order a cascade from elsewhere would reach the rows in.
export async function up(db: Kysely<any>): Promise<void> {
  await onClientOrSalonDelete(db, 'restrict');
}

export async function down(db: Kysely<any>): Promise<void> {
  await onClientOrSalonDelete(db, 'cascade');
}

async function onClientOrSalonDelete(db: Kysely<any>, action: 'restrict' | 'cascade') {
  for (const table of ['skin_tests', 'strand_tests']) {
    const key = (column: string) => sql.ref(`${table}_${column}_fkey`);
    await sql`
      alter table ${sql.table(table)}
        drop constraint ${key('client_id')},
        drop constraint ${key('salon_id')},
        add constraint ${key('client_id')} foreign key (client_id) references clients(id) on delete ${sql.raw(action)},
        add constraint ${key('salon_id')} foreign key (salon_id) references salons(id) on delete ${sql.raw(action)}
    `.execute(db);
  }
}
