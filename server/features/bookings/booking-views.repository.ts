import { sql } from 'kysely';
import { DateTime } from 'luxon';
import { formatIso, zoneClock } from '@shared/engine/local-time';
import type { Db } from '@server/db/database';
import type { BookingView } from '@shared/schemas/booking-view.schemas';
import type { BookingStatus } from '@shared/schemas/common.schemas';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import type { Salon } from '@shared/schemas/salon.schemas';
import { limitFor, type ProcessingLimits } from '@shared/rules/processing-limits';
import { noShowFrom } from '@shared/rules/sitting-status';
import { depositState, type DepositState } from '@shared/rules/deposit-state';

export interface BookingFilter {
  salonId: string;
  /** Bookings with a sitting overlapping [from, to). */
  from?: Date;
  to?: Date;
  stylistId?: string;
  clientId?: string;
  bookingId?: string;
  statuses?: BookingStatus[];
}

const LIVE: BookingStatus[] = ['held', 'booked', 'checked_in', 'finished', 'checked_out', 'no_show'];

/** A booking as the book shows it, less its skin-test state, and what that state is worked out from. */
export interface BookingViewRow {
  view: Omit<BookingView, 'skinTest'>;
  skinTestFooting: { clientId: string; status: BookingStatus; plan: StepPlan; serviceAsks: boolean; starts: Date[] };
}

/** The salon's skin-test settings, read with its bookings so a day's book costs no extra query. */
export type SkinTestSettings = Pick<Salon, 'skinTestLeadHours' | 'skinTestValidityDays' | 'skinTestFamilies'>;

/**
 * Bookings with all their sittings and steps, times as ISO 8601 in the salon's zone, earliest first. The
 * skin-test state is a rule, so booking-views.service.ts adds it.
 */
export async function loadBookingViewRows(
  db: Db,
  filter: BookingFilter,
  timeZone: string,
): Promise<{ rows: BookingViewRow[]; settings: SkinTestSettings | null }> {
  let query = db
    .selectFrom('bookings as b')
    .innerJoin('clients as c', 'c.id', 'b.client_id')
    .innerJoin('services as s', 's.id', 'b.service_id')
    .innerJoin('staff as st', 'st.id', 'b.stylist_id')
    .innerJoin('salons as sa', 'sa.id', 'b.salon_id')
    .select([
      'b.id',
      'b.status',
      'b.price_cents',
      'b.deposit_cents',
      'b.deposit_outcome',
      'b.deposit_due_by',
      'b.cancel_reason',
      'b.step_plan',
      'c.id as clientId',
      'c.name as clientName',
      's.id as serviceId',
      's.name as serviceName',
      's.needs_skin_test',
      'st.id as stylistId',
      'st.display_name as stylistName',
    ])
    .select(['sa.skin_test_lead_hours', 'sa.skin_test_validity_days', 'sa.skin_test_families', 'sa.no_show_grace_minutes'])
    .select(['sa.lightener_max_minutes', 'sa.oxidative_colour_max_minutes', 'sa.toner_oxidative_max_minutes', 'sa.colour_remover_max_minutes'])
    .where('b.salon_id', '=', filter.salonId)
    .where('b.status', 'in', filter.statuses ?? LIVE);
  if (filter.stylistId) query = query.where('b.stylist_id', '=', filter.stylistId);
  if (filter.clientId) query = query.where('b.client_id', '=', filter.clientId);
  if (filter.bookingId) query = query.where('b.id', '=', filter.bookingId);
  if (filter.from && filter.to) {
    const range = sql`tstzrange(${filter.from}, ${filter.to}, '[)')`;
    query = query.where(({ exists, selectFrom }) =>
      exists(
        selectFrom('sittings as x')
          .select('x.id')
          .whereRef('x.booking_id', '=', 'b.id')
          .where(sql<boolean>`x.during && ${range}`),
      ),
    );
  }
  const bookings = await query.execute();
  const [first] = bookings;
  if (!first) return { rows: [], settings: null };
  const ids = bookings.map((b) => b.id);
  const [sittings, steps, money] = await Promise.all([loadSittings(db, ids), loadSteps(db, ids), loadDepositMoney(db, ids)]);
  const iso = isoInZone(timeZone, filter);
  const sittingsOf = groupBy(sittings, (s) => s.booking_id);
  const stepsOf = groupBy(steps, (st) => st.sitting_id);
  const settings = {
    skinTestLeadHours: first.skin_test_lead_hours,
    skinTestValidityDays: first.skin_test_validity_days,
    skinTestFamilies: first.skin_test_families as Salon['skinTestFamilies'],
  };
  const limits: ProcessingLimits = {
    lightener: first.lightener_max_minutes,
    oxidative_colour: first.oxidative_colour_max_minutes,
    toner_oxidative: first.toner_oxidative_max_minutes,
    colour_remover: first.colour_remover_max_minutes,
  };
  const orNull = (d: Date | null) => (d ? iso(d) : null);
  const rows = bookings.map((b): BookingViewRow => {
    const own = sittingsOf.get(b.id) ?? [];
    const plan = b.step_plan as StepPlan;
    const skinTestFooting = { clientId: b.clientId, status: b.status, plan, serviceAsks: b.needs_skin_test, starts: own.map((s) => s.start) };
    const view = {
      id: b.id,
      status: b.status,
      client: { id: b.clientId, name: b.clientName },
      service: { id: b.serviceId, name: b.serviceName },
      stylist: { id: b.stylistId, name: b.stylistName },
      priceCents: b.price_cents,
      depositCents: b.deposit_cents,
      depositOutcome: b.deposit_outcome,
      deposit: withDueBy(
        depositState({ depositCents: b.deposit_cents, bookingStatus: b.status, outcome: b.deposit_outcome, ...(money.get(b.id) ?? NO_MONEY) }),
        orNull(b.deposit_due_by),
      ),
      cancelReason: b.cancel_reason,
      stepPlan: plan,
      sittings: own.map((s) => ({
        seq: s.seq,
        of: own.length,
        chairId: s.chair_id,
        chairName: s.chairName,
        start: iso(s.start),
        end: iso(s.end),
        status: s.status,
        arrivedAt: orNull(s.arrived_at),
        lateMinutes: s.late_minutes,
        noShowFrom: iso(noShowFrom(s.start, first.no_show_grace_minutes)),
        steps: (stepsOf.get(s.id) ?? []).map((st) => {
          const planned = plan.sittings[s.seq - 1]?.steps[st.seq - 1];
          const range = planned?.kind === 'developing' ? planned : null;
          return {
            kind: st.kind,
            label: st.label,
            start: iso(st.start),
            end: iso(st.end),
            basinName: st.basinName,
            minMinutes: range?.minMinutes ?? null,
            maxMinutes: range?.maxMinutes ?? null,
            product: planned?.product ?? 'none',
            limitMinutes: planned ? limitFor(planned.product, limits, planned.kind === 'developing' && (planned.heat ?? false)) : null,
            actualStart: orNull(st.actual_start),
            actualEnd: orNull(st.actual_end),
          };
        }),
      })),
    };
    return { view, skinTestFooting };
  });
  // Every booking is written with at least one sitting.
  rows.sort((a, b) => a.view.sittings[0]!.start.localeCompare(b.view.sittings[0]!.start));
  return { rows, settings };
}

function groupBy<T>(rows: T[], key: (row: T) => string): Map<string, T[]> {
  const groups = new Map<string, T[]>();
  for (const row of rows) {
    const group = groups.get(key(row));
    if (group) group.push(row);
    else groups.set(key(row), [row]);
  }
  return groups;
}

/**
 * ISO 8601 in the salon's zone, as luxon's toISO({ suppressMilliseconds: true }) writes it. A week of the
 * book prints thousands of instants and luxon's per-instant zone lookup was most of the request's CPU,
 * so whole-second instants go through the engine's offset table instead.
 */
export function isoInZone(timeZone: string, filter: Pick<BookingFilter, 'from' | 'to'>): (d: Date) => string {
  const luxon = (d: Date) => DateTime.fromJSDate(d, { zone: timeZone }).toISO({ suppressMilliseconds: true })!;
  // A fixed zone such as UTC prints as "Z" in luxon; keep luxon's text there.
  if (DateTime.now().setZone(timeZone).zone.isUniversal) return luxon;
  const day = (d: Date | undefined, fallback: number) => (d ? Math.floor(d.getTime() / 86_400_000) : fallback);
  const today = Math.floor(Date.now() / 86_400_000);
  const clock = zoneClock(timeZone, day(filter.from, today), day(filter.to, today) + 1);
  return (d) => {
    const ms = d.getTime();
    if (ms % 1000 !== 0) return luxon(d);
    const minute = Math.floor(ms / 60_000);
    const text = formatIso(minute, clock.offsetAt(minute));
    const seconds = (ms / 1000) % 60;
    return `${text.slice(0, 16)}:${seconds < 10 ? '0' : ''}${seconds}${text.slice(16)}`;
  };
}

/** The release time matters only while something is due (a paid or cancelled booking is released by nobody). */
const withDueBy = (state: DepositState, dueBy: string | null) => ({ ...state, dueBy: state.dueCents > 0 ? dueBy : null });

const NO_MONEY = { paidCents: 0, refundedCents: 0 };

/** Per booking: deposit payments taken, and refunds of them made or on their way (a pending refund is decided). */
async function loadDepositMoney(db: Db, bookingIds: string[]): Promise<Map<string, { paidCents: number; refundedCents: number }>> {
  const rows = await db
    .selectFrom('payments as p')
    .leftJoin('payments as of', 'of.id', 'p.refund_of')
    .select([
      'p.booking_id',
      sql<string>`coalesce(sum(p.amount_cents) filter (where p.kind = 'deposit' and p.status = 'succeeded'), 0)`.as('paid'),
      sql<string>`coalesce(sum(p.amount_cents) filter (where p.kind = 'refund' and of.kind = 'deposit' and p.status in ('pending', 'succeeded')), 0)`.as(
        'refunded',
      ),
    ])
    .where('p.booking_id', 'in', bookingIds)
    .groupBy('p.booking_id')
    .execute();
  return new Map(rows.map((r) => [r.booking_id, { paidCents: Number(r.paid), refundedCents: Number(r.refunded) }]));
}

/** One booking's deposit money: taken, and refunded (made or on its way). */
export async function depositMoneyOf(db: Db, bookingId: string): Promise<{ paidCents: number; refundedCents: number }> {
  return (await loadDepositMoney(db, [bookingId])).get(bookingId) ?? NO_MONEY;
}

function loadSittings(db: Db, bookingIds: string[]) {
  return db
    .selectFrom('sittings as s')
    .innerJoin('chairs as ch', 'ch.id', 's.chair_id')
    .select([
      's.id',
      's.booking_id',
      's.seq',
      's.chair_id',
      's.status',
      's.arrived_at',
      's.late_minutes',
      'ch.name as chairName',
      sql<Date>`lower(s.during)`.as('start'),
      sql<Date>`upper(s.during)`.as('end'),
    ])
    .where('s.booking_id', 'in', bookingIds)
    .orderBy('s.seq')
    .execute();
}

function loadSteps(db: Db, bookingIds: string[]) {
  return db
    .selectFrom('booking_steps as st')
    .innerJoin('sittings as s', 's.id', 'st.sitting_id')
    .leftJoin('basins as bs', 'bs.id', 'st.basin_id')
    .select([
      'st.sitting_id',
      'st.seq',
      'st.kind',
      'st.label',
      'st.actual_start',
      'st.actual_end',
      'bs.name as basinName',
      sql<Date>`lower(st.during)`.as('start'),
      sql<Date>`upper(st.during)`.as('end'),
    ])
    .where('s.booking_id', 'in', bookingIds)
    .orderBy('st.sitting_id')
    .orderBy('st.seq')
    .execute();
}
