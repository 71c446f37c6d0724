import { sql, type Kysely } from 'kysely';

// The send log: every message Dwell means to send, one row per (booking, sitting, kind, channel, version).
// The unique dedupe key makes planning idempotent; the status column is the transactional claim that keeps
// two workers from sending the same row. bookings.version is bumped on every move so reminders planned
// for an older time are dropped and the new ones get new keys.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    alter table bookings add column version integer not null default 1;
    alter table salons add column reminder_offsets_hours integer[] not null default '{48,24}';
    alter table salons add column quiet_from time not null default '21:00';
    alter table salons add column quiet_to time not null default '08:00';

    create table messages (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      booking_id uuid references bookings(id) on delete set null,
      booking_version integer,
      client_id uuid references clients(id) on delete set null,
      kind text not null,
      channel text not null check (channel in ('sms', 'email')),
      to_address text not null,
      subject text not null default '',
      body text not null,
      attachments jsonb not null default '[]',
      send_at timestamptz not null,
      dedupe_key text not null unique,
      status text not null default 'queued' check (status in ('queued', 'sending', 'sent', 'failed', 'dropped')),
      attempts integer not null default 0,
      last_error text,
      provider_ref text,
      claimed_at timestamptz,
      sent_at timestamptz,
      created_at timestamptz not null default now()
    );
    create index messages_due on messages(send_at) where status = 'queued';
    create index messages_stuck on messages(claimed_at) where status = 'sending';
    create index messages_booking on messages(booking_id);
    create index messages_salon_created on messages(salon_id, created_at desc);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    drop table messages;
    alter table salons drop column quiet_to, drop column quiet_from, drop column reminder_offsets_hours;
    alter table bookings drop column version;
  `.execute(db);
}
