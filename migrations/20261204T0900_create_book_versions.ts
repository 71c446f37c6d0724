import { sql, type Kysely } from 'kysely';

// A per-salon number that moves whenever anything a calendar read or a free-time search depends on
// changes: bookings, sittings, steps, clients' and services' names, staff, hours, time off, chairs,
// basins, out-of-service periods and the salon's own settings. App servers cache those reads under it;
// because the number lives here and moves in the same transaction as the change, a booking made through
// one server is seen at once by every other.
//
// The triggers are deferred constraint triggers: the version row is locked only while the writing
// transaction commits, after it has taken every other lock it needs, so writers for different stylists
// do not queue behind each other for longer than a commit and cannot deadlock on the version row.
// The transaction id guard makes a booking with many steps write the row once, not once per step.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table book_versions (
      salon_id uuid primary key,
      version bigint not null default 1,
      bumped_by bigint not null default 0
    );

    create function bump_book_version(p_salon uuid) returns void language plpgsql as $$
    begin
      if p_salon is null then return; end if;
      insert into book_versions as v (salon_id, version, bumped_by) values (p_salon, 1, txid_current())
      on conflict (salon_id) do update set version = v.version + 1, bumped_by = excluded.bumped_by
        where v.bumped_by <> excluded.bumped_by;
    end $$;

    -- Tables that carry the salon themselves (the salons table is its own salon).
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

    -- Sittings, through their booking. A sitting deleted with its booking is covered by the booking's own trigger.
    create function book_changed_by_sitting() returns trigger language plpgsql as $$
    begin
      perform bump_book_version((select salon_id from bookings where id = coalesce(new.booking_id, old.booking_id)));
      return null;
    end $$;

    create function book_changed_by_step() returns trigger language plpgsql as $$
    begin
      perform bump_book_version((
        select b.salon_id from sittings s join bookings b on b.id = s.booking_id where s.id = coalesce(new.sitting_id, old.sitting_id)
      ));
      return null;
    end $$;

    -- Staff hours and time off, through the stylist.
    create function book_changed_by_staff_row() returns trigger language plpgsql as $$
    begin
      perform bump_book_version((select salon_id from staff where id = coalesce(new.staff_id, old.staff_id)));
      return null;
    end $$;
  `.execute(db);

  const triggers: [string, string][] = [
    ['salons', 'book_changed_by_salon'],
    ['salon_hours', 'book_changed_by_salon'],
    ['staff', 'book_changed_by_salon'],
    ['chairs', 'book_changed_by_salon'],
    ['basins', 'book_changed_by_salon'],
    ['services', 'book_changed_by_salon'],
    ['clients', 'book_changed_by_salon'],
    ['bookings', 'book_changed_by_salon'],
    ['out_of_service', 'book_changed_by_salon'],
    ['sittings', 'book_changed_by_sitting'],
    ['booking_steps', 'book_changed_by_step'],
    ['staff_hours', 'book_changed_by_staff_row'],
    ['time_off', 'book_changed_by_staff_row'],
  ];
  for (const [table, fn] of triggers) {
    await sql`
      create constraint trigger ${sql.raw(`${table}_book_version`)}
      after insert or update or delete on ${sql.table(table)}
      deferrable initially deferred
      for each row execute function ${sql.raw(fn)}()
    `.execute(db);
  }
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const table of ['salons', 'salon_hours', 'staff', 'chairs', 'basins', 'services', 'clients', 'bookings', 'out_of_service', 'sittings', 'booking_steps', 'staff_hours', 'time_off']) {
    await sql`drop trigger ${sql.raw(`${table}_book_version`)} on ${sql.table(table)}`.execute(db);
  }
  await sql`
    drop function book_changed_by_staff_row();
    drop function book_changed_by_step();
    drop function book_changed_by_sitting();
    drop function book_changed_by_salon();
    drop function bump_book_version(uuid);
    drop table book_versions;
  `.execute(db);
}
