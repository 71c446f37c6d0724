import { sql, type Kysely } from 'kysely';

// How each client wants to hear from the salon. Service messages (confirmations, reminders, aftercare) go on
// the chosen channel(s); marketing follow-ups only with a separate opt-in. sms_stopped_at records an inbound
// STOP reply: it switches SMS off whatever the channel says, until the client replies START.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    alter table clients add column message_channel text not null default 'both' check (message_channel in ('sms', 'email', 'both'));
    alter table clients add column marketing_opt_in boolean not null default false;
    alter table clients add column sms_stopped_at timestamptz;
    create index clients_phone on clients(phone) where phone is not null;
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    drop index clients_phone;
    alter table clients drop column sms_stopped_at, drop column marketing_opt_in, drop column message_channel;
  `.execute(db);
}
