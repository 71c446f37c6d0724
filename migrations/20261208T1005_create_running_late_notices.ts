import { sql, type Kysely } from 'kysely';

// "Running about 20 minutes late — see you at 3:20": a later client is told once per sitting and delay. The primary
// key is that rule, so two desks (or a late start applied after "Tell the client") can never send the same notice
// twice, whatever the code does; a longer delay is a new notice. The message itself goes through the send log.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table running_late_notices (
      sitting_id uuid not null references sittings(id) on delete cascade,
      minutes_late integer not null check (minutes_late between 1 and 240),
      told_at timestamptz not null,
      told_by uuid references users(id) on delete set null,
      primary key (sitting_id, minutes_late)
    );
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table running_late_notices;`.execute(db);
}
