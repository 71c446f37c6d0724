/**
 * The engine bench's busy salon written into PostgreSQL as real rows: a salon, 12 stylists (with user
 * accounts), 14 chairs, 4 basins, a small menu, a few hundred clients and ~60 bookings a day from the
 * same seeded generator as `npm run bench` (tests/engine/scenario-generator.ts), so the database holds a
 * book that obeys the engine's rules (no double-booked chair, basin or hands; client caps kept).
 *
 *   const busy = await loadBusySalon(db, { from: '2027-03-01', months: 3 });
 *
 * Used by `npm run bench:utilisation` and by load tests. Keep the name and the signature stable.
 */
import { randomUUID } from 'node:crypto';
import type { Insertable, Kysely } from 'kysely';
import { DateTime } from 'luxon';
import type { Database } from '@server/db/schema';
import { hashPassword } from '@server/auth/password';
import { tstzRange } from '@server/features/bookings/bookings.repository';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import type { ScenarioInput } from '@shared/engine/scenario.schemas';
import { generateScenario, seededRng } from '../engine/scenario-generator';

export interface BusySalonOptions {
  /** First local date (YYYY-MM-DD, America/Denver) of the book. */
  from: string;
  /** How many calendar months of bookings from `from`. */
  months: number;
  /** Bookings that end before this are finished (or no-shows); later ones are booked. Default: now. */
  now?: Date;
  /** Generator seed; the same seed gives the same book. Default 2027 (the engine bench's). */
  seed?: number;
  /** Password of the owner, desk and stylist accounts. Default BUSY_SALON_PASSWORD. */
  password?: string;
}

export interface BusySalon {
  salonId: string;
  slug: string;
  timeZone: string;
  /** Local dates: `from` inclusive, `to` exclusive. */
  from: string;
  to: string;
  ownerEmail: string;
  deskEmail: string;
  stylistEmails: string[];
  password: string;
  counts: { stylists: number; chairs: number; basins: number; services: number; clients: number; bookings: number; cancelled: number; noShows: number };
}

export const BUSY_SALON_PASSWORD = 'busy-salon-bench-2027';
const ZONE = 'America/Denver';
/** The engine bench's density: 2,500 bookings in 42 days. */
const BOOKINGS_PER_DAY = 2500 / 42;
const CLIENTS = 600;
const CHUNK = 1000;

type Kind = 'hands_on' | 'developing' | 'basin';
type GeneratedBooking = NonNullable<ScenarioInput['bookings']>[number];

/** The menu: one service per step pattern the generator draws, priced as a salon might. */
const MENU: Array<{ pattern: string; name: string; category: 'colour' | 'cut' | 'treatment'; skill: string; priceCents: number; depositCents: number }> = [
  { pattern: 'hands_on,developing,basin', name: 'Colour and rinse', category: 'colour', skill: 'colour', priceCents: 12000, depositCents: 3000 },
  { pattern: 'hands_on', name: 'Cut', category: 'cut', skill: 'cut', priceCents: 6000, depositCents: 0 },
  { pattern: 'hands_on,developing,hands_on', name: 'Colour and finish', category: 'colour', skill: 'colour', priceCents: 15000, depositCents: 4000 },
  { pattern: 'basin,hands_on', name: 'Wash and cut', category: 'cut', skill: 'cut', priceCents: 7000, depositCents: 0 },
];

const toDate = (local: string) => DateTime.fromISO(local, { zone: ZONE }).toJSDate();
const minutes = (a: string, b: string) => Math.round((toDate(b).getTime() - toDate(a).getTime()) / 60_000);

/** A step plan matching the booked steps: fixed steps as booked, developing allowed ±10 minutes around it. */
function planOf(steps: GeneratedBooking['steps']): StepPlan {
  return {
    sittings: [
      {
        steps: steps.map((s, i) => {
          const m = minutes(s.start, s.end);
          const label = `Step ${i + 1}`;
          return s.kind === 'developing'
            ? { kind: 'developing' as const, label, product: 'none' as const, minMinutes: Math.max(5, m - 10), maxMinutes: Math.min(240, m + 10) }
            : { kind: s.kind, label, product: 'none' as const, minutes: Math.max(5, m) };
        }),
      },
    ],
  };
}

async function insertChunked<T>(rows: T[], insert: (chunk: T[]) => Promise<unknown>): Promise<void> {
  for (let i = 0; i < rows.length; i += CHUNK) await insert(rows.slice(i, i + CHUNK));
}

/** Writes the busy salon (one transaction: all or nothing) and says what it wrote. */
export async function loadBusySalon(db: Kysely<Database>, options: BusySalonOptions): Promise<BusySalon> {
  const now = options.now ?? new Date();
  const password = options.password ?? BUSY_SALON_PASSWORD;
  const start = DateTime.fromISO(options.from, { zone: ZONE });
  const end = start.plus({ months: options.months });
  const days = Math.round(end.diff(start, 'days').days);
  const rng = seededRng(options.seed ?? 2027);
  const scenario = generateScenario(rng, {
    zone: ZONE,
    from: options.from,
    days,
    granularity: 5,
    stylists: 12,
    colourStylists: 8,
    chairs: 14,
    basins: 4,
    bookings: Math.round(BOOKINGS_PER_DAY * days),
    salonHours: [540, 1260],
    stylistStarts: [540, 570, 600, 660],
    stylistEnds: [1020, 1080, 1140, 1200],
    timeOffChance: 0.5,
    maxClients: [1, 2, 2, 3],
  });
  const passwordHash = await hashPassword(password);
  const tag = randomUUID().slice(0, 8);
  const slug = `busy-salon-${tag}`;

  return db.transaction().execute(async (trx) => {
    const { id: salonId } = await trx
      .insertInto('salons')
      .values({ slug, name: `Busy Salon ${tag}`, time_zone: ZONE, currency: 'USD', granularity_minutes: 5 })
      .returning('id')
      .executeTakeFirstOrThrow();
    await trx
      .insertInto('salon_hours')
      .values(scenario.salonHours.map((h) => ({ salon_id: salonId, rrule: h.rrule, start_time: h.start, end_time: h.end })))
      .execute();
    const user = (email: string, name: string, role: 'owner' | 'front_desk' | 'stylist') =>
      trx
        .insertInto('users')
        .values({ salon_id: salonId, email, name, role, phone: null, password_hash: passwordHash })
        .returning('id')
        .executeTakeFirstOrThrow();
    const ownerEmail = `owner.${tag}@busy.test`;
    const deskEmail = `desk.${tag}@busy.test`;
    await user(ownerEmail, 'Busy Owner', 'owner');
    await user(deskEmail, 'Busy Desk', 'front_desk');

    const staffIds = new Map<string, string>();
    const stylistEmails: string[] = [];
    for (const st of scenario.stylists) {
      const email = `${st.id}.${tag}@busy.test`;
      const u = await user(email, `Stylist ${st.id}`, 'stylist');
      const row = await trx
        .insertInto('staff')
        .values({
          salon_id: salonId,
          user_id: u.id,
          display_name: `Stylist ${st.id.toUpperCase()}`,
          skills: st.skills ?? [],
          max_clients_at_once: st.maxClientsAtOnce ?? 1,
        })
        .returning('id')
        .executeTakeFirstOrThrow();
      staffIds.set(st.id, row.id);
      stylistEmails.push(email);
      await trx
        .insertInto('staff_hours')
        .values((st.hours ?? []).map((h) => ({ staff_id: row.id, rrule: h.rrule, start_time: h.start, end_time: h.end })))
        .execute();
      for (const off of st.timeOff ?? []) {
        await trx
          .insertInto('time_off')
          .values({ staff_id: row.id, during: tstzRange(toDate(off.start), toDate(off.end)), reason: 'Time off' })
          .execute();
      }
    }
    const named = async (table: 'chairs' | 'basins', ids: string[], prefix: string) => {
      const rows = await trx
        .insertInto(table)
        .values(ids.map((_id, i) => ({ salon_id: salonId, name: `${prefix} ${String(i + 1).padStart(2, '0')}` })))
        .returning('id')
        .execute();
      return new Map(ids.map((id, i) => [id, rows[i]!.id]));
    };
    const chairIds = await named(
      'chairs',
      scenario.chairs.map((c) => c.id),
      'Chair',
    );
    const basinIds = await named(
      'basins',
      (scenario.basins ?? []).map((b) => b.id),
      'Basin',
    );

    const services = new Map<string, { id: string; priceCents: number; depositCents: number }>();
    for (const m of MENU) {
      const kinds = m.pattern.split(',') as Kind[];
      const plan: StepPlan = {
        sittings: [
          {
            steps: kinds.map((kind, i) =>
              kind === 'developing'
                ? { kind, label: `Step ${i + 1}`, product: 'none' as const, minMinutes: 10, maxMinutes: 45 }
                : { kind, label: `Step ${i + 1}`, product: 'none' as const, minutes: 20 },
            ),
          },
        ],
      };
      const row = await trx
        .insertInto('services')
        .values({
          salon_id: salonId,
          name: m.name,
          category: m.category,
          skill: m.skill,
          price_cents: m.priceCents,
          deposit_cents: m.depositCents,
          step_plan: JSON.stringify(plan),
        })
        .returning('id')
        .executeTakeFirstOrThrow();
      services.set(m.pattern, { id: row.id, priceCents: m.priceCents, depositCents: m.depositCents });
    }
    const clients = await trx
      .insertInto('clients')
      .values(
        Array.from({ length: CLIENTS }, (_, i) => ({
          salon_id: salonId,
          name: `Busy client ${String(i + 1).padStart(3, '0')}`,
          email: `client${i + 1}.${tag}@busy.test`,
          phone: null,
        })),
      )
      .returning('id')
      .execute();

    // Rows with their ids made here, so bookings, sittings and steps go in as a few multi-row inserts.
    const bookingRows: Insertable<Database['bookings']>[] = [];
    const sittingRows: Array<{ id: string; booking_id: string; seq: number; chair_id: string; during: string; live: boolean }> = [];
    const stepRows: Array<{
      sitting_id: string;
      seq: number;
      kind: Kind;
      label: string;
      stylist_id: string;
      basin_id: string | null;
      during: string;
      live: boolean;
    }> = [];
    // One row per money movement: each deposit paid, and a refund naming it where the cancellation refunded it.
    const paymentRows: Insertable<Database['payments']>[] = [];
    const refundRows: Insertable<Database['payments']>[] = [];
    let cancelled = 0;
    let noShows = 0;
    for (const b of scenario.bookings ?? []) {
      const service = services.get(b.steps.map((s) => s.kind).join(','))!;
      const first = toDate(b.steps[0]!.start);
      const last = toDate(b.steps[b.steps.length - 1]!.end);
      const roll = rng();
      const status = roll < 0.05 ? 'cancelled' : last <= now ? (roll < 0.08 ? 'no_show' : 'finished') : 'booked';
      const live = status !== 'cancelled';
      // Cancelled a day or a week ahead: inside or outside the 48-hour window.
      const cancelledAt = status === 'cancelled' ? new Date(first.getTime() - (rng() < 0.4 ? 1 : 7) * 86_400_000) : null;
      const outcome =
        status === 'cancelled' && service.depositCents > 0 ? (first.getTime() - cancelledAt!.getTime() < 48 * 3_600_000 ? 'kept' : 'refunded') : null;
      if (status === 'cancelled') cancelled++;
      if (status === 'no_show') noShows++;
      const bookingId = randomUUID();
      const clientId = clients[Math.floor(rng() * clients.length)]!.id;
      bookingRows.push({
        id: bookingId,
        salon_id: salonId,
        client_id: clientId,
        service_id: service.id,
        stylist_id: staffIds.get(b.stylist)!,
        status,
        step_plan: JSON.stringify(planOf(b.steps)),
        price_cents: service.priceCents,
        deposit_cents: service.depositCents,
        held_until: null,
        cancel_reason: status === 'cancelled' ? 'Client asked to cancel' : null,
        deposit_outcome: outcome,
        created_by: null,
        created_at: new Date(first.getTime() - 14 * 86_400_000),
      });
      if (service.depositCents > 0) {
        const pay = {
          salon_id: salonId,
          booking_id: bookingId,
          client_id: clientId,
          amount_cents: service.depositCents,
          currency: 'USD',
          status: 'succeeded' as const,
        };
        const paymentId = randomUUID();
        paymentRows.push({ ...pay, id: paymentId, kind: 'deposit', provider_ref: `pi_busy_${bookingId}` });
        if (outcome === 'refunded') refundRows.push({ ...pay, kind: 'refund', refund_of: paymentId, provider_ref: `re_busy_${bookingId}` });
      }
      const sittingId = randomUUID();
      sittingRows.push({ id: sittingId, booking_id: bookingId, seq: 1, chair_id: chairIds.get(b.chair)!, during: tstzRange(first, last), live });
      b.steps.forEach((s, j) => {
        stepRows.push({
          sitting_id: sittingId,
          seq: j + 1,
          kind: s.kind,
          label: `Step ${j + 1}`,
          stylist_id: staffIds.get(b.stylist)!,
          basin_id: s.kind === 'basin' ? basinIds.get(s.basin)! : null,
          during: tstzRange(toDate(s.start), toDate(s.end)),
          live,
        });
      });
    }
    await insertChunked(bookingRows, (rows) => trx.insertInto('bookings').values(rows).execute());
    await insertChunked(sittingRows, (rows) => trx.insertInto('sittings').values(rows).execute());
    await insertChunked(stepRows, (rows) => trx.insertInto('booking_steps').values(rows).execute());
    await insertChunked(paymentRows, (rows) => trx.insertInto('payments').values(rows).execute());
    await insertChunked(refundRows, (rows) => trx.insertInto('payments').values(rows).execute());
    return {
      salonId,
      slug,
      timeZone: ZONE,
      from: options.from,
      to: end.toISODate()!,
      ownerEmail,
      deskEmail,
      stylistEmails,
      password,
      counts: {
        stylists: scenario.stylists.length,
        chairs: scenario.chairs.length,
        basins: scenario.basins?.length ?? 0,
        services: MENU.length,
        clients: CLIENTS,
        bookings: bookingRows.length,
        cancelled,
        noShows,
      },
    };
  });
}
