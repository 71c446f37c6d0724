import { sql, type Kysely } from 'kysely';

// Screens that update themselves: the triggers that move the book's versions (migrations/20261204T0900) also
// NOTIFY the `dwell_book` channel, so every app server LISTENing hears of a change whichever server made it,
// and tells its open event streams for that salon (server/features/live-events/).
//
// The payload is small and names nothing personal: {"salonId", "dates", "bookingId"}. `dates` are the local dates
// the change touches (a booking's sittings plus a range a moved sitting left, or a time off's dates); null when
// the change reaches every date (the salon's set-up, staff, a client's name, a deleted booking, a long period).
// NOTIFY is sent when the transaction commits and not at all when it rolls back, and PostgreSQL delivers one
// copy of identical payloads per transaction, so the per-row triggers do not repeat themselves.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    -- The local dates a period covers, as bump_book_days counts them; none for an unbounded or a longer period,
    -- which moves the salon's number (and so tells of every date) instead.
    create function book_local_days(p_zone text, p_during tstzrange) returns setof date language sql stable as $$
      select d::date from generate_series(
        (lower(p_during) at time zone p_zone)::date,
        ((upper(p_during) - interval '1 microsecond') at time zone p_zone)::date,
        interval '1 day') d
      where p_during is not null and not isempty(p_during) and not lower_inf(p_during) and not upper_inf(p_during)
        and ((upper(p_during) - interval '1 microsecond') at time zone p_zone)::date - (lower(p_during) at time zone p_zone)::date <= 62
    $$;

    create function notify_book_change(p_salon uuid, p_dates date[], p_booking uuid) returns void language plpgsql as $$
    begin
      if p_salon is null then return; end if;
      perform pg_notify('dwell_book', json_build_object('salonId', p_salon, 'dates', p_dates, 'bookingId', p_booking)::text);
    end $$;

    create or replace function bump_book_version(p_salon uuid) returns void language plpgsql as $$
    begin
      if p_salon is null then return; end if;
      insert into book_versions as v (salon_id, version, bumped_by) values (p_salon, 1, txid_current())
      on conflict (salon_id) do update set version = v.version + 1, bumped_by = excluded.bumped_by
        where v.bumped_by <> excluded.bumped_by;
      perform notify_book_change(p_salon, null, null);
    end $$;

    create or replace function bump_booking_days(p_booking uuid, p_left tstzrange) returns void language plpgsql as $$
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
      perform notify_book_change(b.salon_id, array(
        select l.d from book_local_days(b.time_zone, p_left) as l(d)
        union
        select x.d from sittings st cross join lateral book_local_days(b.time_zone, st.during) as x(d) where st.booking_id = p_booking
        order by 1
      ), p_booking);
    end $$;

    create or replace function book_changed_by_period() returns trigger language plpgsql as $$
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
      perform notify_book_change(salon, array(
        select o.d from book_local_days(zone, case when tg_op <> 'INSERT' then old.during end) as o(d)
        union
        select n.d from book_local_days(zone, case when tg_op <> 'DELETE' then new.during end) as n(d)
        order by 1
      ), null);
      return null;
    end $$;
  `.execute(db);
}

// Back to the definitions of migrations/20261204T0900, without the NOTIFY.
export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    create or replace function bump_book_version(p_salon uuid) returns void language plpgsql as $$
    begin
      if p_salon is null then return; end if;
      insert into book_versions as v (salon_id, version, bumped_by) values (p_salon, 1, txid_current())
      on conflict (salon_id) do update set version = v.version + 1, bumped_by = excluded.bumped_by
        where v.bumped_by <> excluded.bumped_by;
    end $$;

    create or replace function bump_booking_days(p_booking uuid, p_left tstzrange) returns void language plpgsql as $$
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

    create or replace function book_changed_by_period() returns trigger language plpgsql as $$
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

    drop function notify_book_change(uuid, date[], uuid);
    drop function book_local_days(text, tstzrange);
  `.execute(db);
}
