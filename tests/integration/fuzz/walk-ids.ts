import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import { demoSalon } from '@server/demo/demo-catalogue';

/**
 * Real ids of the demo salon, by what they name, so a walk's otherwise valid requests reach past "not found"
 * to the code (and the database) behind: the demo client's own booking and card, Ana's staff record…
 */
export interface WalkIds {
  /** By kind: booking, client, service, stylist (Ana), staff (Marcus), chair, basin, photo, standby, skinTest, consultation, rule, timeOff, outOfService. */
  byKind: Record<string, string>;
  slug: string;
}

const first = async (q: { executeTakeFirst(): Promise<{ id: string } | undefined> }) => (await q.executeTakeFirst())?.id;

export async function walkIds(db: Kysely<Database>): Promise<WalkIds> {
  const salon = await db.selectFrom('salons').select('id').where('slug', '=', demoSalon.slug).executeTakeFirstOrThrow();
  const client = await db
    .selectFrom('clients')
    .innerJoin('users', 'users.id', 'clients.user_id')
    .select('clients.id')
    .where('users.email', '=', 'client@demo.test')
    .executeTakeFirstOrThrow();
  const staffOf = (email: string) =>
    db
      .selectFrom('staff')
      .innerJoin('users', 'users.id', 'staff.user_id')
      .select(['staff.id', 'users.id as userId'])
      .where('users.email', '=', email)
      .executeTakeFirstOrThrow();
  // Ana is the stylist the walk signs in as; set-up routes (keyed by the user's id) change Marcus, so no write of
  // the walk ends Ana's session.
  const [stylist, staff] = await Promise.all([staffOf('ana@demo.test'), staffOf('marcus@demo.test')]);
  // Each of these tables has an id and a salon_id; one query shape serves them all.
  const inSalon = (table: 'services' | 'chairs' | 'basins' | 'standby_entries' | 'follow_up_rules' | 'consultations') =>
    first(
      db
        .selectFrom(table as 'services')
        .select('id')
        .where('salon_id', '=', salon.id)
        .limit(1),
    );
  const found: Record<string, string | undefined> = {
    client: client.id,
    stylist: stylist.id,
    staff: staff.userId,
    booking: await first(
      db.selectFrom('bookings').select('id').where('client_id', '=', client.id).where('stylist_id', '=', stylist.id).where('status', '=', 'booked').limit(1),
    ),
    service: await inSalon('services'),
    chair: await inSalon('chairs'),
    basin: await inSalon('basins'),
    standby: await inSalon('standby_entries'),
    rule: await inSalon('follow_up_rules'),
    consultation: await inSalon('consultations'),
    photo: await first(db.selectFrom('client_photos').select('id').where('client_id', '=', client.id).limit(1)),
    skinTest: await first(db.selectFrom('skin_tests').select('id').where('client_id', '=', client.id).limit(1)),
    timeOff: await first(db.selectFrom('time_off').select('id').limit(1)),
    outOfService: await first(db.selectFrom('out_of_service').select('id').limit(1)),
  };
  const byKind = Object.fromEntries(Object.entries(found).filter((e): e is [string, string] => e[1] !== undefined));
  return { byKind, slug: demoSalon.slug };
}

// Which kind of record a field or path parameter names: by its own name (`clientId`), or for a bare `{id}`,
// by the path segment before it (`/clients/{id}`).
const KIND_BY_NAME: Record<string, string> = {
  bookings: 'booking',
  clients: 'client',
  services: 'service',
  staff: 'staff',
  stylists: 'stylist',
  units: 'chair',
  photos: 'photo',
  standby: 'standby',
  'skin-tests': 'skinTest',
  consultations: 'consultation',
  'follow-up-rules': 'rule',
  'time-off': 'timeOff',
  'out-of-service': 'outOfService',
  holds: 'booking',
};

/** The real id for a field (`stylistId`, `chairIds`) or path parameter (`{id}` after `segment`), if the walk has one. */
export function idFor(ids: WalkIds, name: string, segment?: string): string | undefined {
  const kind =
    /^(id|entryId|testId)$/.test(name) && segment
      ? KIND_BY_NAME[segment]
      : name.replace(/Ids?$/, '').replace(/^(from|into)(\w)/, (_m, _p, c: string) => c.toLowerCase());
  return kind ? ids.byKind[kind] : undefined;
}
