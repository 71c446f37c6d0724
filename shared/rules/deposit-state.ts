import type { BookingStatus } from '../schemas/common.schemas';

/*
 * Where a booking's deposit stands, from the money that really moved (payments in, refunds out, each in the
 * currency's minor unit) and what a cancellation or no-show decided. One rule for every screen and for the server's
 * decision to refund a payment nobody owed.
 */

export type DepositStatus = 'none' | 'due' | 'paid' | 'refunded' | 'kept';

export interface DepositFacts {
  /** What the booking asks as a deposit. */
  depositCents: number;
  bookingStatus: BookingStatus;
  /** What cancelling or a no-show decided for the deposit; null while the booking runs. */
  outcome: 'kept' | 'refunded' | null;
  /** Deposit payments taken, and refunds of them made or on their way. */
  paidCents: number;
  refundedCents: number;
}

export interface DepositState {
  status: DepositStatus;
  /** Taken and not given back. */
  paidCents: number;
  /** Still to pay: nothing once paid, and nothing for a booking that no longer runs. */
  dueCents: number;
}

/** A booking that still asks for its deposit: a held time being paid online, or a booking not over yet. */
const ASKS_DEPOSIT: readonly BookingStatus[] = ['held', 'booked', 'checked_in', 'finished'];

export function depositState(f: DepositFacts): DepositState {
  const net = f.paidCents - f.refundedCents;
  const dueCents = ASKS_DEPOSIT.includes(f.bookingStatus) ? Math.max(0, f.depositCents - net) : 0;
  const state = (status: DepositStatus): DepositState => ({ status, paidCents: Math.max(0, net), dueCents });
  if (net > 0 && f.outcome === 'kept') return state('kept');
  // Decided at the cancellation; the refund's own movement is recorded when it is made.
  if (net > 0 && f.outcome === 'refunded') return state('refunded');
  if (f.paidCents > 0 && net <= 0) return state('refunded');
  if (dueCents > 0) return state('due');
  return state(net > 0 ? 'paid' : 'none');
}

/** The sitting a deposit is asked for: the first still to come (a correction's second sitting), else the first. */
export function sittingAhead<S extends { start: string; end: string }>(sittings: S[], now: Date): S | undefined {
  return sittings.find((s) => Date.parse(s.end) > now.getTime()) ?? sittings[0];
}

/**
 * How much of one payment goes back because nobody owed it: what the booking may hold as its deposit (`allowedCents`:
 * its deposit while it runs, nothing once its held time lapsed or it was cancelled) against everything taken, this
 * payment included. Never more than is left of this payment, never less than nothing.
 */
export function refundBeyondDue(input: { allowedCents: number; netPaidCents: number; thisPaymentLeftCents: number }): number {
  const beyond = input.netPaidCents - input.allowedCents;
  return Math.min(Math.max(0, beyond), Math.max(0, input.thisPaymentLeftCents));
}
