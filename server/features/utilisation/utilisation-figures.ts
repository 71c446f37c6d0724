/**
 * The booking figures of a period (attendance, corrections, services, per stylist and per week) from the period's
 * sittings, and its money (revenue and deposits) from the period's payments. Pure: every definition is in
 * docs/utilisation.md.
 */
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import type { PeriodSitting } from './utilisation-bookings.repository';
import type { PeriodPayment } from './utilisation-payments.repository';

/** Statuses whose time is (or will be) worked and paid for. */
const KEPT = new Set(['booked', 'checked_in', 'finished', 'checked_out']);
/** Statuses of a booking that ended without the visit: its deposit, unless refunded, is kept. */
const ENDED_UNSERVED = new Set(['cancelled', 'no_show']);
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
  /** The period's payments and refunds (tips left out): the money figures. */
  payments: PeriodPayment[];
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
    // Chair time follows the sittings: each kept sitting counts in the period (and week) it starts in.
    for (const s of sittings) {
      if (!kept || !inPeriod(s.start)) continue;
      const service = services.get(b.serviceId) ?? { serviceId: b.serviceId, name: b.serviceName, chairMinutes: 0, sittings: 0, revenueCents: 0 };
      service.chairMinutes += minutes(s);
      service.sittings += 1;
      services.set(b.serviceId, service);
    }
    // Everything counted per booking belongs to the period of its first sitting.
    if (!inPeriod(first.start)) continue;
    attendance.bookings++;
    stylist.bookings++;
    weeks[weekOf(first.start)]!.bookings++;
    // A no-show is the booking's status or a no-show marked on any of its sittings (a correction may go on after one).
    if (b.status === 'no_show' || sittings.some((s) => s.sittingStatus === 'no_show')) {
      attendance.noShows++;
      stylist.noShows++;
    }
    if (b.status === 'cancelled') {
      attendance.cancelled++;
      const at = input.cancelledAt.get(b.bookingId);
      const late = b.depositOutcome === 'kept' || (at !== undefined && first.start - at.getTime() < input.cancellationWindowHours * 3_600_000);
      if (late) attendance.lateCancels++;
    }
    const quoted = b.stepPlan && quotedMinutes(b.stepPlan);
    if (kept && quoted && b.category === 'colour' && (b.stepPlan!.sittings.length > 1 || quoted.max >= CORRECTION_MIN_MINUTES)) {
      corrections.push({ booked: bookedMinutes, ...quoted });
    }
  }
  // Money is what was paid, less what went back, when it was recorded (tips are the stylists', not the salon's).
  const keptOf = new Map<string, number>();
  const refundedOf = new Set<string>();
  for (const p of input.payments) {
    if (!inPeriod(p.at)) continue;
    const signed = p.kind === 'refund' ? -p.amountCents : p.amountCents;
    revenueCents += signed;
    weeks[weekOf(p.at)]!.revenueCents += signed;
    const stylist = stylists.get(p.stylistId) ?? emptyTally();
    stylist.revenueCents += signed;
    stylists.set(p.stylistId, stylist);
    const service = services.get(p.serviceId);
    if (service) service.revenueCents += signed;
    const isDeposit = p.kind === 'deposit' || p.ofKind === 'deposit';
    if (p.kind === 'deposit') {
      deposits.taken++;
      deposits.takenCents += p.amountCents;
    }
    if (p.kind === 'refund' && p.ofKind === 'deposit') {
      deposits.refundedCents += p.amountCents;
      refundedOf.add(p.bookingId);
    }
    // A deposit the salon keeps: its booking ended without the visit (cancelled, a no-show) and it was not refunded.
    if (isDeposit && ENDED_UNSERVED.has(p.bookingStatus) && p.depositOutcome !== 'refunded') keptOf.set(p.bookingId, (keptOf.get(p.bookingId) ?? 0) + signed);
  }
  deposits.refunded = refundedOf.size;
  for (const cents of keptOf.values()) {
    if (cents <= 0) continue;
    deposits.kept++;
    deposits.keptCents += cents;
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
