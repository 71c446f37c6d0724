import { sql, type Kysely } from 'kysely';

// Accounts for every role. The session table is the one connect-pg-simple expects.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table users (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      email text not null,
      name text not null,
      phone text,
      role text not null check (role in ('client', 'front_desk', 'stylist', 'owner')),
      password_hash text not null,
      active boolean not null default true,
      password_changed_at timestamptz not null default now(),
      created_at timestamptz not null default now()
    );
    create unique index users_email on users (lower(email));

    create table password_resets (
      id uuid primary key default gen_random_uuid(),
      user_id uuid not null references users(id) on delete cascade,
      token_hash text not null unique,
      expires_at timestamptz not null,
      used_at timestamptz
    );

    create table sign_in_attempts (
      id bigint generated always as identity primary key,
      email text not null,
      ip text not null,
      succeeded boolean not null,
      at timestamptz not null default now()
    );
    create index sign_in_attempts_email on sign_in_attempts (email, at);
    create index sign_in_attempts_ip on sign_in_attempts (ip, at);

    create table session (
      sid varchar not null primary key,
      sess json not null,
      expire timestamp(6) not null
    );
    create index session_expire on session (expire);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table session; drop table sign_in_attempts; drop table password_resets; drop table users;`.execute(db);
}
