import { sql, type Kysely } from 'kysely';

// When a skin test's reading was written down (not the read time typed in, which may lie in the past). An owner's
// clearance counts only when recorded after the reaction was known, so this instant is the database's own.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    alter table skin_tests add column read_recorded_at timestamptz;
    update skin_tests set read_recorded_at = greatest(created_at, read_at) where result <> 'pending';
    create function skin_tests_read_recorded_at() returns trigger language plpgsql as $$
    begin
      if new.result <> 'pending' and (tg_op = 'INSERT' or old.result = 'pending') then
        new.read_recorded_at := now();
      end if;
      return new;
    end $$;
    create trigger skin_tests_read_recorded_at before insert or update of result on skin_tests
      for each row execute function skin_tests_read_recorded_at();
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    drop trigger skin_tests_read_recorded_at on skin_tests;
    drop function skin_tests_read_recorded_at();
    alter table skin_tests drop column read_recorded_at;
  `.execute(db);
}
