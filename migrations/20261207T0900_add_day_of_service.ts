import { sql, type Kysely } from 'kysely';

// Running the day: each sitting keeps where it stands (booked → arrived → in progress → finished, or no-show),
// when the client arrived and how late; each step keeps its actual start and end beside its planned `during`, and
// who tapped them. Every tap is kept with the state it changed, so the last one can be undone for a minute. The
// salon's no-show grace is how long past a sitting's planned start the desk waits before it may mark a no-show.
// Sittings and steps already have book-version triggers for every update, so cached reads follow these columns.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    alter table salons
      add column no_show_grace_minutes integer not null default 15 check (no_show_grace_minutes between 0 and 240);

    alter table sittings
      add column status text not null default 'booked'
        check (status in ('booked', 'arrived', 'in_progress', 'finished', 'no_show')),
      add column arrived_at timestamptz,
      add column late_minutes integer check (late_minutes >= 0),
      add column left_open_reason text,
      add constraint sittings_arrival_kept check ((status in ('booked', 'no_show')) = (arrived_at is null));

    alter table booking_steps
      add column actual_start timestamptz,
      add column actual_end timestamptz,
      add column started_by uuid references users(id) on delete set null,
      add column finished_by uuid references users(id) on delete set null,
      add constraint booking_steps_actual_order check (actual_end is null or (actual_start is not null and actual_end >= actual_start));

    create table sitting_taps (
      id uuid primary key default gen_random_uuid(),
      sitting_id uuid not null references sittings(id) on delete cascade,
      action text not null check (action in ('arrive', 'no_show', 'start', 'finish', 'finish_sitting')),
      step_seq integer check (step_seq >= 1),
      at timestamptz not null,
      by_user_id uuid references users(id) on delete set null,
      before jsonb not null,
      undone_at timestamptz
    );
    create index sitting_taps_latest on sitting_taps(sitting_id, at desc);

    -- Bookings the app already marked before sittings had a status: finished and no-show bookings' sittings
    -- follow them; a checked-in booking's sittings are arrived, or finished once they have ended.
    update sittings s set status = case
        when b.status = 'finished' then 'finished'
        when b.status = 'no_show' then 'no_show'
        when upper(s.during) <= now() then 'finished'
        else 'arrived'
      end,
      arrived_at = case when b.status in ('finished', 'checked_in') then lower(s.during) end,
      late_minutes = case when b.status in ('finished', 'checked_in') then 0 end
    from bookings b
    where b.id = s.booking_id and b.status in ('finished', 'no_show', 'checked_in');
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    drop table sitting_taps;
    alter table booking_steps drop constraint booking_steps_actual_order,
      drop column actual_start, drop column actual_end, drop column started_by, drop column finished_by;
    alter table sittings drop constraint sittings_arrival_kept,
      drop column status, drop column arrived_at, drop column late_minutes, drop column left_open_reason;
    alter table salons drop column no_show_grace_minutes;
  `.execute(db);
}
