import { sql, type Kysely } from 'kysely';

// Who recorded a skin or strand test (and who read a skin test) stays on the record after their account
// is removed: the name is copied when the row is written, by trigger so that every writer (the API, the
// demo loader) gets it. A later rename of the account does not change a record already made.
// Existing rows are filled from users; a skin test that was stored already read was read by its recorder,
// since recording it was the only way to store a reading.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    alter table skin_tests
      add column recorded_by_name text,
      add column read_by uuid references users(id) on delete set null,
      add column read_by_name text;
    alter table strand_tests add column recorded_by_name text;

    update skin_tests t set recorded_by_name = u.name from users u where u.id = t.recorded_by;
    update strand_tests t set recorded_by_name = u.name from users u where u.id = t.recorded_by;
    update skin_tests set read_by = recorded_by, read_by_name = recorded_by_name where read_at is not null;

    -- TG_ARGV: the column holding a user's id, and the column that keeps their name (filled only when empty).
    create function keep_user_name() returns trigger language plpgsql as $$
    declare
      fields jsonb := to_jsonb(new);
    begin
      if fields->>TG_ARGV[0] is not null and fields->>TG_ARGV[1] is null then
        new := jsonb_populate_record(new, jsonb_build_object(TG_ARGV[1], (select name from users where id = (fields->>TG_ARGV[0])::uuid)));
      end if;
      return new;
    end $$;
    create trigger skin_tests_recorder_name before insert on skin_tests
      for each row execute function keep_user_name('recorded_by', 'recorded_by_name');
    create trigger strand_tests_recorder_name before insert on strand_tests
      for each row execute function keep_user_name('recorded_by', 'recorded_by_name');
    create trigger skin_tests_reader_name before insert or update of read_by on skin_tests
      for each row execute function keep_user_name('read_by', 'read_by_name');
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    drop trigger skin_tests_reader_name on skin_tests;
    drop trigger strand_tests_recorder_name on strand_tests;
    drop trigger skin_tests_recorder_name on skin_tests;
    drop function keep_user_name();
    alter table strand_tests drop column recorded_by_name;
    alter table skin_tests drop column read_by_name, drop column read_by, drop column recorded_by_name;
  `.execute(db);
}
