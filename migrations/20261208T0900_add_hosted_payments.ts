import { sql, type Kysely } from 'kysely';

// Money through a hosted payment page: Dwell never sees a card. A payment session (the provider's Checkout Session)
// is opened once per booking and amount and kept in checkout_sessions, so every tab and retry reuses it; the
// provider's signed webhook confirms the payment, each event recorded once in payment_events.
//
// payments becomes one row per money movement (a deposit, later a balance or tip, or a refund naming the payment it
// returns), by card (online through the provider, or the desk's card terminal) or in cash, with who recorded it at
// the desk. A refund Dwell decides on is written `pending` first and sent to the provider after the commit, under an
// idempotency key of its own id, so it is made once whatever retries. Rows written before as one `refunded` row
// become the payment and its refund.
//
// The desk can ask for a deposit by a link (deposit_requests, the token kept hashed); a salon may release desk
// bookings whose deposit is still unpaid some hours after booking (salons.unpaid_deposit_release_hours, the time
// fixed on each booking as deposit_due_by when it is made). Payments show on the book's views, so they move the
// booking's dates in the book version (and tell the live streams) as a change to the booking does.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    alter table payments drop constraint payments_status_check;
    alter table payments
      add column kind text not null default 'deposit' check (kind in ('deposit', 'balance', 'refund', 'tip')),
      add column method text not null default 'card' check (method in ('card', 'cash')),
      add column provider_session_id text,
      add column refund_of uuid references payments(id) on delete restrict,
      add column recorded_by uuid references users(id) on delete set null;

    insert into payments (salon_id, booking_id, client_id, amount_cents, currency, status, message, created_at, kind, refund_of)
      select salon_id, booking_id, client_id, amount_cents, currency, 'succeeded', message, created_at, 'refund', id
      from payments where status = 'refunded';
    update payments set status = 'succeeded', message = '' where status = 'refunded';

    alter table payments
      add constraint payments_status_check check (status in ('pending', 'succeeded', 'declined', 'failed')),
      add constraint payments_refund_names_payment check ((kind = 'refund') = (refund_of is not null));
    create unique index payments_provider_ref_once on payments(provider_ref) where status in ('pending', 'succeeded');
    create unique index payments_one_per_checkout on payments(provider_session_id) where kind <> 'refund';
    create index payments_refund_of on payments(refund_of);
    create index payments_pending on payments(created_at) where status = 'pending';

    create table checkout_sessions (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      -- no foreign key: a hold that lapses is removed, and a late payment must still find what it was for
      booking_id uuid not null,
      client_id uuid references clients(id) on delete set null,
      kind text not null check (kind in ('deposit', 'balance')),
      amount_cents integer not null check (amount_cents > 0),
      currency char(3) not null,
      -- what the client pays for, as the hosted page shows it
      description text not null,
      success_url text not null,
      cancel_url text not null,
      provider_session_id text unique,
      url text,
      status text not null default 'open' check (status in ('open', 'completed', 'expired')),
      expires_at timestamptz not null,
      created_at timestamptz not null default now()
    );
    create unique index checkout_sessions_one_open on checkout_sessions(booking_id, kind) where status = 'open';

    create table payment_events (
      event_id text primary key,
      type text not null,
      object_id text,
      received_at timestamptz not null default now()
    );

    create table deposit_requests (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      booking_id uuid not null references bookings(id) on delete cascade,
      token_hash text not null unique,
      channel text not null check (channel in ('sms', 'email')),
      amount_cents integer not null check (amount_cents > 0),
      requested_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now()
    );
    create index deposit_requests_booking on deposit_requests(booking_id, created_at desc);

    alter table salons add column unpaid_deposit_release_hours integer check (unpaid_deposit_release_hours between 1 and 720);
    alter table bookings add column deposit_due_by timestamptz;
    create index bookings_deposit_due on bookings(deposit_due_by) where deposit_due_by is not null and status = 'booked';

    create function book_changed_by_payment() returns trigger language plpgsql as $$
    begin
      perform bump_booking_days(coalesce(new.booking_id, old.booking_id), null);
      return null;
    end $$;
    create constraint trigger payments_book_version
      after insert or update or delete on payments
      deferrable initially deferred
      for each row execute function book_changed_by_payment();
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    drop trigger payments_book_version on payments;
    drop function book_changed_by_payment();
    drop index bookings_deposit_due;
    alter table bookings drop column deposit_due_by;
    alter table salons drop column unpaid_deposit_release_hours;
    drop table deposit_requests;
    drop table payment_events;
    drop table checkout_sessions;
    drop index payments_pending;
    drop index payments_refund_of;
    drop index payments_one_per_checkout;
    drop index payments_provider_ref_once;
    alter table payments drop constraint payments_refund_names_payment, drop constraint payments_status_check;
    update payments p set status = 'refunded', message = r.message from payments r where r.refund_of = p.id;
    delete from payments where kind <> 'deposit';
    alter table payments
      drop column recorded_by, drop column refund_of, drop column provider_session_id, drop column method, drop column kind;
    alter table payments add constraint payments_status_check check (status in ('succeeded', 'declined', 'refunded'));
  `.execute(db);
}
