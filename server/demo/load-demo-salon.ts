import { sql } from 'kysely';
import { DateTime } from 'luxon';
import type { Db } from '../db/database';
import type { Insertable, Kysely } from 'kysely';
import type { Database, PaymentsTable } from '../db/schema';
import type { BookingStatus } from '@shared/schemas/common.schemas';
import { hashPassword } from '../auth/password';
import { insertBooking, tstzRange, type NewStep } from '../features/bookings/bookings.repository';
import { DEMO_PASSWORD, demoClientNames, demoSalon, demoServices, demoStaff, type ServiceKey, type StylistKey } from './demo-catalogue';
import { correctionDayOne, correctionDayTwo, ordinaryDay, type Placement } from './demo-day-patterns';
import { insertDemoConsultations } from './demo-consultations';
import { insertDemoProducts } from './demo-products';
import { planDemoMessages } from './demo-messages';
import { recordPastActuals } from './demo-actuals';

export async function isDatabaseEmpty(db: Db): Promise<boolean> {
  const row = await db
    .selectFrom('salons')
    .select(sql<number>`count(*)::int`.as('n'))
    .executeTakeFirstOrThrow();
  return row.n === 0;
}

interface Ids {
  salonId: string;
  deskUserId: string;
  stylists: Record<StylistKey, string>;
  chairs: string[];
  basins: string[];
  services: Record<ServiceKey, string>;
  clients: string[];
}

/** Loads the demo salon with two weeks of bookings around `now` (one transaction: all or nothing). */
export async function loadDemoSalon(db: Kysely<Database>, now: Date): Promise<{ bookings: number }> {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  return db.transaction().execute(async (trx) => {
    const ids = await insertSalonAndPeople(trx, passwordHash, now);
    const bookings = await insertDemoBook(trx, ids, now);
    await insertDemoStandby(trx, ids);
    await insertDemoConsultations(trx, ids, now);
    await insertDemoProducts(trx, ids.salonId);
    await planDemoMessages(trx, ids.salonId, ids.services, now);
    return { bookings };
  });
}

async function insertSalonAndPeople(db: Db, passwordHash: string, now: Date): Promise<Ids> {
  const { hours, chairs, basins, ...salon } = demoSalon;
  const { id: salonId } = await db
    .insertInto('salons')
    .values({ slug: salon.slug, name: salon.name, time_zone: salon.timeZone, currency: salon.currency, address: salon.address, phone: salon.phone })
    .returning('id')
    .executeTakeFirstOrThrow();
  await db
    .insertInto('salon_hours')
    .values(hours.map((h) => ({ salon_id: salonId, rrule: h.rrule, start_time: h.start, end_time: h.end })))
    .execute();
  const user = (p: { email: string; name: string; role: 'owner' | 'front_desk' | 'stylist' | 'client' }) =>
    db
      .insertInto('users')
      .values({ salon_id: salonId, email: p.email, name: p.name, role: p.role, phone: null, password_hash: passwordHash })
      .returning('id')
      .executeTakeFirstOrThrow();
  await user(demoStaff.owner);
  const desk = await user(demoStaff.desk);
  const stylists = {} as Record<StylistKey, string>;
  for (const [key, s] of Object.entries(demoStaff.stylists) as [StylistKey, (typeof demoStaff.stylists)[StylistKey]][]) {
    const u = await user({ ...s, role: 'stylist' });
    const row = await db
      .insertInto('staff')
      .values({ salon_id: salonId, user_id: u.id, display_name: s.name, skills: s.skills, max_clients_at_once: s.maxClientsAtOnce })
      .returning('id')
      .executeTakeFirstOrThrow();
    await db.insertInto('staff_hours').values({ staff_id: row.id, rrule: s.hours.rrule, start_time: s.hours.start, end_time: s.hours.end }).execute();
    stylists[key] = row.id;
  }
  const chairIds = await insertNamed(db, 'chairs', salonId, chairs);
  const basinIds = await insertNamed(db, 'basins', salonId, basins);
  const services = {} as Record<ServiceKey, string>;
  for (const [key, s] of Object.entries(demoServices) as [ServiceKey, (typeof demoServices)[ServiceKey]][]) {
    const row = await db
      .insertInto('services')
      .values({
        salon_id: salonId,
        name: s.name,
        description: s.description,
        category: s.category,
        skill: s.skill,
        price_cents: s.priceCents,
        price_is_from: s.priceIsFrom ?? false,
        deposit_cents: s.depositCents ?? 0,
        online_bookable: s.onlineBookable ?? false,
        needs_skin_test: s.needsSkinTest ?? false,
        step_plan: JSON.stringify(s.plan),
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    services[key] = row.id;
  }
  const clients: string[] = [];
  for (const [i, name] of demoClientNames.entries()) {
    const handle = name.toLowerCase().replace(/[^a-z]+/g, '.');
    const clientUser = i === 0 ? await user({ email: 'client@demo.test', name, role: 'client' }) : null;
    const row = await db
      .insertInto('clients')
      .values({
        salon_id: salonId,
        user_id: clientUser?.id ?? null,
        name,
        email: i === 0 ? 'client@demo.test' : `${handle}@example.com`,
        phone: `+1970555${String(1000 + i * 37).slice(-4)}`,
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    clients.push(row.id);
  }
  await insertDemoSkinTests(db, salonId, clients, now);
  return { salonId, deskUserId: desk.id, stylists, chairs: chairIds, basins: basinIds, services, clients };
}

const hasDemoTest = (i: number) => i % 6 !== 4;
const hasNegativeDemoTest = (i: number) => hasDemoTest(i) && i !== 9;

/** Most clients have a recent negative skin test; a few have none, one had a reaction. */
async function insertDemoSkinTests(db: Db, salonId: string, clients: string[], now: Date): Promise<void> {
  const rows = clients.flatMap((clientId, i) => {
    if (!hasDemoTest(i)) return []; // no test on record: the desk must book one first
    const appliedAt = DateTime.fromJSDate(now)
      .minus({ days: 20 + ((i * 7) % 40) })
      .set({ hour: 10, minute: 0 })
      .toJSDate();
    const readAt = DateTime.fromJSDate(appliedAt).plus({ hours: 48 }).toJSDate();
    return [
      {
        salon_id: salonId,
        client_id: clientId,
        applied_at: appliedAt,
        read_at: readAt,
        result: hasNegativeDemoTest(i) ? ('negative' as const) : ('positive' as const),
        product: 'Permanent colour 6.0 with 6% developer',
      },
    ];
  });
  await db.insertInto('skin_tests').values(rows).execute();
}

/** Three clients who asked to be called when a short service opens up. */
async function insertDemoStandby(db: Db, ids: Ids): Promise<void> {
  const weekdays = { weekdays: [2, 3, 4, 5, 6], from: '09:00', to: '18:00' };
  const entries = [
    { client: 11, services: ['tonerRefresh', 'blowDry'] as ServiceKey[], stylist: null, notes: 'Works nearby; can come in 20 minutes.' },
    { client: 17, services: ['tonerRefresh'] as ServiceKey[], stylist: ids.stylists.ana, notes: 'Wants Ana for toner.' },
    { client: 23, services: ['fringeTrim', 'blowDry'] as ServiceKey[], stylist: null, notes: '' },
  ];
  await db
    .insertInto('standby_entries')
    .values(
      entries.map((e) => ({
        salon_id: ids.salonId,
        client_id: ids.clients[e.client]!, // the demo salon has more clients than these indices
        service_ids: e.services.map((k) => ids.services[k]),
        stylist_id: e.stylist,
        availability: JSON.stringify([weekdays]),
        notes: e.notes,
        created_by: ids.deskUserId,
      })),
    )
    .execute();
}

async function insertNamed(db: Db, table: 'chairs' | 'basins', salonId: string, names: string[]): Promise<string[]> {
  const rows = await db
    .insertInto(table)
    .values(names.map((name) => ({ salon_id: salonId, name })))
    .returning(['id', 'name'])
    .execute();
  return names.map((n) => rows.find((r) => r.name === n)!.id);
}

/** Bookings on every open day from 7 days before to 7 days after today, the correction around today. */
async function insertDemoBook(db: Db, ids: Ids, now: Date): Promise<number> {
  const zone = demoSalon.timeZone;
  const today = DateTime.fromJSDate(now, { zone }).startOf('day');
  const openDays = [...Array(15).keys()].map((i) => today.plus({ days: i - 7 })).filter((d) => d.weekday >= 2 && d.weekday <= 6);
  const firstFuture = openDays.findIndex((d) => d >= today);
  // Sitting 2 three open days after sitting 1: 3 to 5 calendar days, inside the quote rules' days between sittings.
  // Fifteen days hold ten or eleven open days, so these indices are in range.
  const correctionDay1 = openDays[Math.max(0, firstFuture - 1)]!;
  const correctionDay2 = openDays[Math.max(0, firstFuture - 1) + 3]!;
  const marcusOff = openDays[openDays.length - 2]!;
  await db
    .insertInto('time_off')
    .values({ staff_id: ids.stylists.marcus, during: tstzRange(marcusOff.toJSDate(), marcusOff.plus({ days: 1 }).toJSDate()), reason: 'Training day' })
    .execute();

  let count = 0;
  const deposits: Insertable<PaymentsTable>[] = [];
  let clientTurn = 1; // client 0 (the demo client account) has the correction
  // Oxidative colour only for clients whose skin test allows it (see insertDemoSkinTests).
  const nextClient = (needsSkinTest: boolean): number => {
    for (;;) {
      const i = 1 + (clientTurn++ % (ids.clients.length - 1));
      if (!needsSkinTest || hasNegativeDemoTest(i)) return i;
    }
  };
  for (const [dayIndex, day] of openDays.entries()) {
    const pattern = day.equals(correctionDay1) ? correctionDayOne : day.equals(correctionDay2) ? correctionDayTwo : ordinaryDay;
    for (const [i, p] of pattern.entries()) {
      if (p.service === 'correction' && p.sitting === 1) continue; // stored with sitting 1
      if (p.stylist === 'lee' && day.weekday === 2) continue; // Lee does not work Tuesdays
      if (p.stylist === 'marcus' && day.equals(marcusOff)) continue;
      if (!p.core && (dayIndex * 7 + i * 3) % 5 === 0) continue; // leave some gaps so days differ
      // nextClient stays inside the client list.
      const clientId = p.service === 'correction' ? ids.clients[0]! : ids.clients[nextClient(demoServices[p.service].needsSkinTest === true)]!;
      const sittings = [{ day, placement: p }];
      if (p.service === 'correction') sittings.push({ day: correctionDay2, placement: correctionDayTwo[0]! });
      const steps = sittings.map((s) => placeSteps(s.day, s.placement, ids));
      const status = statusFor(
        steps.map((st) => ({ start: st[0]!.start, end: st.at(-1)!.end })),
        today.toJSDate(),
        count,
      );
      const service = demoServices[p.service];
      const bookingId = await insertBooking(db, {
        salonId: ids.salonId,
        clientId,
        serviceId: ids.services[p.service],
        stylistId: ids.stylists[p.stylist],
        status,
        stepPlan: service.plan,
        priceCents: service.priceCents,
        depositCents: service.depositCents ?? 0,
        createdBy: ids.deskUserId,
        cancelReason: status === 'cancelled' ? 'Client asked to cancel (moving house)' : undefined,
        sittings: sittings.map((s, i) => ({ chairId: ids.chairs[s.placement.chair]!, steps: steps[i]! })),
      });
      if (status !== 'cancelled') await recordPastActuals(db, bookingId, count, today.toJSDate(), status === 'no_show');
      const deposit = demoDeposit(ids, { bookingId, clientId, status, depositCents: service.depositCents ?? 0, firstStart: steps[0]![0]!.start }, count, now);
      if (deposit) deposits.push(deposit);
      count++;
    }
  }
  if (deposits.length) await db.insertInto('payments').values(deposits).execute();
  return count;
}

/**
 * Deposits as the desk takes them: paid some days before the first sitting, in cash or on the card terminal, except every fourth
 * booking still to come, whose deposit is due (to ask for by SMS or e-mail, or take at the desk). Cancelled ones paid nothing.
 */
function demoDeposit(
  ids: Ids,
  b: { bookingId: string; clientId: string; status: BookingStatus; depositCents: number; firstStart: Date },
  n: number,
  now: Date,
): Insertable<PaymentsTable> | null {
  if (b.depositCents <= 0 || b.status === 'cancelled' || (b.status === 'booked' && n % 4 === 1)) return null;
  // Taken 3 to 14 days before the first sitting (never later than now), so each day's takings show the deposits
  // taken that day rather than every demo deposit on the day the demo was loaded.
  const paidAt = new Date(Math.min(now.getTime(), b.firstStart.getTime() - (3 + (n % 12)) * 86_400_000));
  return {
    created_at: paidAt,
    salon_id: ids.salonId,
    booking_id: b.bookingId,
    client_id: b.clientId,
    kind: 'deposit',
    method: n % 2 === 0 ? 'card' : 'cash',
    amount_cents: b.depositCents,
    currency: demoSalon.currency,
    provider_ref: null,
    recorded_by: ids.deskUserId,
    status: 'succeeded',
  };
}

function localTime(day: DateTime, hhmm: string): DateTime {
  const [hour, minute] = hhmm.split(':').map(Number);
  return day.set({ hour, minute });
}

/** Walks the service's steps from the start time; developing steps take the placement's minutes. */
function placeSteps(day: DateTime, p: Placement, ids: Ids): NewStep[] {
  // The demo placements name chairs, basins, sittings and developing minutes that exist.
  const steps = demoServices[p.service].plan.sittings[p.sitting ?? 0]!.steps;
  let at = localTime(day, p.start);
  let dev = 0;
  return steps.map((s) => {
    const minutes = s.kind === 'developing' ? p.developing[dev++]! : s.minutes;
    const start = at;
    at = at.plus({ minutes });
    return { kind: s.kind, label: s.label, start: start.toJSDate(), end: at.toJSDate(), basinId: s.kind === 'basin' ? ids.basins[p.basin]! : null };
  });
}

/**
 * Every sitting on a past day: finished (an occasional no-show). Anything today or later starts booked, so the desk
 * and the stylists run today from the start (a correction whose first sitting is past stays booked for its second).
 */
function statusFor(sittings: { start: Date; end: Date }[], todayStart: Date, n: number): BookingStatus {
  if (sittings.at(-1)!.end <= todayStart) return n % 23 === 5 ? 'no_show' : 'finished';
  if (sittings.some((s) => s.start < todayStart)) return 'booked';
  return n % 29 === 11 ? 'cancelled' : 'booked';
}
