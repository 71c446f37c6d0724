/**
 * The day's rules for a sitting, pure: how a booking's status follows its sittings, how late an arrival is, when a
 * no-show may be marked and how long a tap can be undone. docs/glossary.md ("Sitting statuses") says the same.
 */
import type { BookingStatus } from '../schemas/common.schemas';
import type { SittingStatus } from '../schemas/day-of-service.schemas';

/** A tap can be undone for this long after it was made. */
export const UNDO_MS = 60_000;

/**
 * The booking's status from its sittings' (for a booking that is booked or further; holds and cancellations are
 * not touched): checked in while any sitting has arrived or is in progress; once none is still to come, finished if
 * any sitting was finished, else a no-show; otherwise booked (between sittings of a correction, for instance).
 */
export function bookingStatusFor(sittings: readonly SittingStatus[]): Extract<BookingStatus, 'booked' | 'checked_in' | 'finished' | 'no_show'> {
  if (sittings.some((s) => s === 'arrived' || s === 'in_progress')) return 'checked_in';
  if (sittings.every((s) => s === 'finished' || s === 'no_show')) return sittings.includes('finished') ? 'finished' : 'no_show';
  return 'booked';
}

/** Whole minutes the client came after the first step's planned start; 0 when on time or early. */
export function lateMinutes(plannedStart: Date, arrivedAt: Date): number {
  return Math.max(0, Math.floor((arrivedAt.getTime() - plannedStart.getTime()) / 60_000));
}

/** The first instant the desk may mark a sitting's no-show: its planned start plus the salon's grace minutes. */
export function noShowFrom(plannedStart: Date, graceMinutes: number): Date {
  return new Date(plannedStart.getTime() + graceMinutes * 60_000);
}
