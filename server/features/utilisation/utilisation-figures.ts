/**
 * The booking figures of a period (money, deposits, attendance, corrections, services, per stylist and
 * per week), from the period's sittings. Pure: every definition is in docs/utilisation.md.
 */
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import type { PeriodSitting } from './utilisation-bookings.repository';

/** Statuses whose time is (or will be) worked and paid for. */
const KEPT = new Set(['booked', 'checked_in', 'finished', 'checked_out']);
/** A colour booking planned for this long or longer (or over several sittings) counts as a correction. */
export const CORRECTION_MIN_MINUTES = 240;

const minutes = (s: { start: number; end: number }) => (s.end - s.start) / 60_000;
const ratio = (num: number, den: number): number | null => (den === 0 ? null : num / den);
const mean = (xs: number[]): number | null => (xs.length ? xs.reduce((a, b) => a + b, 0) / xs.length : null);

/** The step plan's chair minutes over all sittings: developing at its least and at its most. */
export function quotedMinutes(plan: StepPlan): { min: number; max: number } {
  let min = 0;
  let max = 0;
  for (const s of plan.sittings)
    for (const st of s.steps) {
      min += st.kind === 'developing' ? st.minMinutes : st.minutes;
      max += st.kind === 'developing' ? st.maxMinutes : st.minutes;
    }
  return { min, max };
}

export interface FigureInput {
  sittings: PeriodSitting[];
  /** Instants as milliseconds since 1970. */
  from: number;
  to: number;
  /** Start instants of the period's weeks, then the period's end. */
  weekStarts: number[];
  cancelledAt: Map<string, Date>;
  cancellationWindowHours: number;
}

interface Tally {
  bookings: number;
  noShows: number;
  revenueCents: number;
}

const emptyTally = (): Tally => ({ bookings: 0, noShows: 0, revenueCents: 0 });

export function bookingFigures(input: FigureInput) {
  const { from, to, weekStarts } = input;
  /** Index into `weeks` (one fewer than weekStarts, which ends with the period's end) of the week holding t. */
  const weekOf = (t: number) => {
    let w = 0;
    while (w + 2 < weekStarts.length && weekStarts[w + 1]! <= t) w++;
    return w;
  };
  const inPeriod = (t: number) => t >= from && t < to;
  const byBooking = new Map<string, PeriodSitting[]>();
  for (const s of input.sittings) {
    const list = byBooking.get(s.bookingId);
    if (list) list.push(s);
    else byBooking.set(s.bookingId, [s]);
  }

  const weeks = Array.from({ length: weekStarts.length - 1 }, emptyTally);
  const stylists = new Map<string, Tally>();
  const services = new Map<string, { serviceId: string; name: string; chairMinutes: number; sittings: number; revenueCents: number }>();
  const attendance = { bookings: 0, noShows: 0, cancelled: 0, lateCancels: 0 };
  const deposits = { takenCents: 0, taken: 0, keptCents: 0, kept: 0, refundedCents: 0, refunded: 0 };
  const corrections: Array<{ booked: number; min: number; max: number }> = [];
  let revenueCents = 0;

  for (const sittings of byBooking.values()) {
    const [b] = sittings;
    if (!b) continue; // never: each list starts with the sitting that created it
    const first = sittings.find((s) => s.seq === 1) ?? b;
    const bookedMinutes = sittings.reduce((t, s) => t + minutes(s), 0);
    const stylist = stylists.get(b.stylistId) ?? emptyTally();
    stylists.set(b.stylistId, stylist);
    const kept = KEPT.has(b.status);
    // Money and chair time follow the sittings: a booking's price is shared by its sittings in proportion to their minutes.
    for (const s of sittings) {
      if (!kept || !inPeriod(s.start)) continue;
      const share = b.priceCents * (minutes(s) / bookedMinutes);
      revenueCents += share;
      stylist.revenueCents += share;
      weeks[weekOf(s.start)]!.revenueCents += share;
      const service = services.get(b.serviceId) ?? { serviceId: b.serviceId, name: b.serviceName, chairMinutes: 0, sittings: 0, revenueCents: 0 };
      service.chairMinutes += minutes(s);
      service.sittings += 1;
      service.revenueCents += share;
      services.set(b.serviceId, service);
    }
    // Everything counted per booking belongs to the period of its first sitting.
    if (!inPeriod(first.start)) continue;
    attendance.bookings++;
    stylist.bookings++;
    weeks[weekOf(first.start)]!.bookings++;
    if (b.depositCents > 0) {
      deposits.taken++;
      deposits.takenCents += b.depositCents;
    }
    // A no-show is the booking's status or a no-show marked on any of its sittings (a correction may go on after one).
    if (b.status === 'no_show' || sittings.some((s) => s.sittingStatus === 'no_show')) {
      attendance.noShows++;
      stylist.noShows++;
      // The deposit policy decided at the mark (kept unless the salon keeps nothing); older no-shows kept it.
      if (b.depositCents > 0 && b.depositOutcome === 'refunded') {
        deposits.refunded++;
        deposits.refundedCents += b.depositCents;
      } else if (b.depositCents > 0) {
        deposits.kept++;
        deposits.keptCents += b.depositCents;
      }
    }
    if (b.status === 'cancelled') {
      attendance.cancelled++;
      const at = input.cancelledAt.get(b.bookingId);
      const late = b.depositOutcome === 'kept' || (at !== undefined && first.start - at.getTime() < input.cancellationWindowHours * 3_600_000);
      if (late) attendance.lateCancels++;
      if (b.depositOutcome === 'kept') {
        deposits.kept++;
        deposits.keptCents += b.depositCents;
      }
      if (b.depositOutcome === 'refunded') {
        deposits.refunded++;
        deposits.refundedCents += b.depositCents;
      }
    }
    const quoted = b.stepPlan && quotedMinutes(b.stepPlan);
    if (kept && quoted && b.category === 'colour' && (b.stepPlan!.sittings.length > 1 || quoted.max >= CORRECTION_MIN_MINUTES)) {
      corrections.push({ booked: bookedMinutes, ...quoted });
    }
  }
  return {
    revenueCents,
    deposits,
    attendance: {
      ...attendance,
      noShowRate: ratio(attendance.noShows, attendance.bookings - attendance.cancelled),
      lateCancelRate: ratio(attendance.lateCancels, attendance.bookings),
    },
    corrections: {
      count: corrections.length,
      averageBookedMinutes: mean(corrections.map((c) => c.booked)),
      averageQuotedMinMinutes: mean(corrections.map((c) => c.min)),
      averageQuotedMaxMinutes: mean(corrections.map((c) => c.max)),
    },
    stylists,
    weeks,
    services: [...services.values()].sort((a, b) => b.chairMinutes - a.chairMinutes || a.name.localeCompare(b.name)).slice(0, 10),
  };
}
