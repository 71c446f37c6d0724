import { sql, type Kysely } from 'kysely';

// Versions of what calendar reads and free-time searches depend on, so app servers can cache those reads
// and every server sees a change at once (the versions live here and move in the changing transaction).
//
// - book_versions: one number per salon for changes that reach every day: the salon's settings and hours,
//   staff and their hours, chairs, basins, services, client names; and a deleted booking (a lapsed hold).
// - book_day_versions: one number per salon and local date for changes to bookings, sittings and steps,
//   time off and out-of-service periods: each moves the dates it touches (all of a booking's sittings, since
//   a booking's view shows every sitting, plus the range a moved sitting left). A period longer than 62 days
//   or without an end moves the salon's number instead.
//
// A read's version is the salon's number plus the sum of its dates' numbers: every number only grows, so
// the sum changes whenever anything the read depends on does. The triggers are deferred constraint
// triggers: the version rows are locked only while the writing transaction commits, after it has taken
// every other lock it needs, so writers do not queue behind each other for longer than a commit and cannot
// deadlock on them. The transaction id guard writes each row once per transaction, not once per step.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table book_versions (
      salon_id uuid primary key,
      version bigint not null default 1,
      bumped_by bigint not null default 0
    );
    create table book_day_versions (
      salon_id uuid not null,
      day date not null,
      version bigint not null default 1,
      bumped_by bigint not null default 0,
      primary key (salon_id, day)
    );

    create function bump_book_version(p_salon uuid) returns void language plpgsql as $$
    begin
      if p_salon is null then return; end if;
      insert into book_versions as v (salon_id, version, bumped_by) values (p_salon, 1, txid_current())
      on conflict (salon_id) do update set version = v.version + 1, bumped_by = excluded.bumped_by
        where v.bumped_by <> excluded.bumped_by;
    end $$;

    create function bump_book_days(p_salon uuid, p_zone text, p_during tstzrange) returns void language plpgsql as $$
    declare
      first_day date;
      last_day date;
    begin
      if p_salon is null or p_during is null or isempty(p_during) then return; end if;
      if lower_inf(p_during) or upper_inf(p_during) then
        perform bump_book_version(p_salon);
        return;
      end if;
      first_day := (lower(p_during) at time zone p_zone)::date;
      last_day := ((upper(p_during) - interval '1 microsecond') at time zone p_zone)::date;
      if last_day - first_day > 62 then
        perform bump_book_version(p_salon);
        return;
      end if;
      insert into book_day_versions as v (salon_id, day, version, bumped_by)
        select p_salon, d::date, 1, txid_current() from generate_series(first_day, last_day, interval '1 day') d
      on conflict (salon_id, day) do update set version = v.version + 1, bumped_by = excluded.bumped_by
        where v.bumped_by <> excluded.bumped_by;
    end $$;

    -- Every date any sitting of the booking touches, and a range it has just left.
    create function bump_booking_days(p_booking uuid, p_left tstzrange) returns void language plpgsql as $$
    declare
      b record;
      s record;
    begin
      select bk.salon_id, sa.time_zone into b from bookings bk join salons sa on sa.id = bk.salon_id where bk.id = p_booking;
      if not found then return; end if; -- deleted: the booking's own trigger moved the salon's number
      perform bump_book_days(b.salon_id, b.time_zone, p_left);
      for s in select during from sittings where booking_id = p_booking loop
        perform bump_book_days(b.salon_id, b.time_zone, s.during);
      end loop;
    end $$;

    create function book_changed_by_salon() returns trigger language plpgsql as $$
    begin
      if tg_table_name = 'salons' then
        perform bump_book_version(coalesce(new.id, old.id));
      else
        if tg_op <> 'INSERT' then perform bump_book_version(old.salon_id); end if;
        if tg_op <> 'DELETE' then perform bump_book_version(new.salon_id); end if;
      end if;
      return null;
    end $$;

    create function book_changed_by_booking() returns trigger language plpgsql as $$
    begin
      if tg_op = 'DELETE' then perform bump_book_version(old.salon_id);
      else perform bump_booking_days(new.id, null);
      end if;
      return null;
    end $$;

    create function book_changed_by_sitting() returns trigger language plpgsql as $$
    begin
      perform bump_booking_days(coalesce(new.booking_id, old.booking_id), case when tg_op <> 'INSERT' then old.during end);
      return null;
    end $$;

    create function book_changed_by_step() returns trigger language plpgsql as $$
    begin
      -- A step lies inside its sitting, so its booking's dates cover it; a deleted sitting has its own trigger.
      perform bump_booking_days((select booking_id from sittings where id = coalesce(new.sitting_id, old.sitting_id)), null);
      return null;
    end $$;

    create function book_changed_by_period() returns trigger language plpgsql as $$
    declare
      salon uuid;
      zone text;
    begin
      if tg_table_name = 'time_off' then
        select st.salon_id, sa.time_zone into salon, zone from staff st join salons sa on sa.id = st.salon_id where st.id = coalesce(new.staff_id, old.staff_id);
      else
        select sa.id, sa.time_zone into salon, zone from salons sa where sa.id = coalesce(new.salon_id, old.salon_id);
      end if;
      if salon is null then return null; end if;
      if tg_op <> 'INSERT' then perform bump_book_days(salon, zone, old.during); end if;
      if tg_op <> 'DELETE' then perform bump_book_days(salon, zone, new.during); end if;
      return null;
    end $$;

    -- Staff hours, through the stylist.
    create function book_changed_by_staff_row() returns trigger language plpgsql as $$
    begin
      perform bump_book_version((select salon_id from staff where id = coalesce(new.staff_id, old.staff_id)));
      return null;
    end $$;
  `.execute(db);

  for (const [table, fn] of TRIGGERS) {
    await sql`
      create constraint trigger ${sql.raw(`${table}_book_version`)}
      after insert or update or delete on ${sql.table(table)}
      deferrable initially deferred
      for each row execute function ${sql.raw(fn)}()
    `.execute(db);
  }
}

const TRIGGERS: [string, string][] = [
  ['salons', 'book_changed_by_salon'],
  ['salon_hours', 'book_changed_by_salon'],
  ['staff', 'book_changed_by_salon'],
  ['chairs', 'book_changed_by_salon'],
  ['basins', 'book_changed_by_salon'],
  ['services', 'book_changed_by_salon'],
  ['clients', 'book_changed_by_salon'],
  ['staff_hours', 'book_changed_by_staff_row'],
  ['bookings', 'book_changed_by_booking'],
  ['sittings', 'book_changed_by_sitting'],
  ['booking_steps', 'book_changed_by_step'],
  ['time_off', 'book_changed_by_period'],
  ['out_of_service', 'book_changed_by_period'],
];

export async function down(db: Kysely<any>): Promise<void> {
  for (const [table] of TRIGGERS) {
    await sql`drop trigger ${sql.raw(`${table}_book_version`)} on ${sql.table(table)}`.execute(db);
  }
  await sql`
    drop function book_changed_by_staff_row();
    drop function book_changed_by_period();
    drop function book_changed_by_step();
    drop function book_changed_by_sitting();
    drop function book_changed_by_booking();
    drop function book_changed_by_salon();
    drop function bump_booking_days(uuid, tstzrange);
    drop function bump_book_days(uuid, text, tstzrange);
    drop function bump_book_version(uuid);
    drop table book_day_versions;
    drop table book_versions;
  `.execute(db);
}
