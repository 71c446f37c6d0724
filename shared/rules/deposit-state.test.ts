import { describe, expect, it } from 'vitest';
import { depositState, refundBeyondDue, sittingAhead } from './deposit-state';

// Amounts are whole minor units with each currency's ISO 4217 exponent: cents for USD (2), yen for JPY (0),
// fils for KWD (3). The rule adds and subtracts them as integers, so no currency rounds anything.

describe('depositState', () => {
  const booked = { bookingStatus: 'booked' as const, outcome: null };

  it('is due until the whole deposit is taken, then paid', () => {
    // $65.00 deposit (ISO 4217 USD, exponent 2: 6500 cents).
    expect(depositState({ ...booked, depositCents: 6500, paidCents: 0, refundedCents: 0 })).toEqual({ status: 'due', paidCents: 0, dueCents: 6500 });
    // ¥5,000 deposit with ¥2,000 taken in cash (ISO 4217 JPY, exponent 0: the yen is the minor unit).
    expect(depositState({ ...booked, depositCents: 5000, paidCents: 2000, refundedCents: 0 })).toEqual({ status: 'due', paidCents: 2000, dueCents: 3000 });
    expect(depositState({ ...booked, depositCents: 6500, paidCents: 6500, refundedCents: 0 })).toEqual({ status: 'paid', paidCents: 6500, dueCents: 0 });
  });

  it('says refunded once everything taken went back, and kept when a cancellation kept it', () => {
    // KWD 2.500 (ISO 4217 KWD, exponent 3: 2500 fils) paid and refunded.
    expect(depositState({ ...booked, depositCents: 2500, paidCents: 2500, refundedCents: 2500 })).toEqual({ status: 'refunded', paidCents: 0, dueCents: 2500 });
    expect(depositState({ bookingStatus: 'cancelled', outcome: 'kept', depositCents: 2500, paidCents: 2500, refundedCents: 0 })).toEqual({
      status: 'kept',
      paidCents: 2500,
      dueCents: 0,
    });
    expect(depositState({ bookingStatus: 'cancelled', outcome: 'refunded', depositCents: 2500, paidCents: 2500, refundedCents: 0 }).status).toBe('refunded');
  });

  it('asks nothing of a booking that no longer runs, and nothing when there is no deposit', () => {
    expect(depositState({ bookingStatus: 'cancelled', outcome: 'kept', depositCents: 6500, paidCents: 0, refundedCents: 0 })).toEqual({
      status: 'none',
      paidCents: 0,
      dueCents: 0,
    });
    expect(depositState({ ...booked, depositCents: 0, paidCents: 0, refundedCents: 0 }).status).toBe('none');
  });
});

describe('refundBeyondDue', () => {
  it('refunds a payment for a held time that lapsed in full', () => {
    // KWD 2.500 = 2500 fils (ISO 4217 KWD, exponent 3); nothing may be held once the hold is gone.
    expect(refundBeyondDue({ allowedCents: 0, netPaidCents: 2500, thisPaymentLeftCents: 2500 })).toBe(2500);
  });

  it('refunds only what goes beyond the deposit', () => {
    // ¥5,000 deposit (ISO 4217 JPY, exponent 0): ¥2,000 cash at the desk, then the client pays ¥5,000 online.
    expect(refundBeyondDue({ allowedCents: 5000, netPaidCents: 7000, thisPaymentLeftCents: 5000 })).toBe(2000);
    // $65.00 (ISO 4217 USD, exponent 2): the card payment that completes the deposit exactly keeps all of it.
    expect(refundBeyondDue({ allowedCents: 6500, netPaidCents: 6500, thisPaymentLeftCents: 6500 })).toBe(0);
  });

  it('never refunds more than is left of the payment', () => {
    // Refunded at the provider already ($25.00 of $25.00): nothing more goes back.
    expect(refundBeyondDue({ allowedCents: 0, netPaidCents: 0, thisPaymentLeftCents: 0 })).toBe(0);
    expect(refundBeyondDue({ allowedCents: 0, netPaidCents: 5000, thisPaymentLeftCents: 2500 })).toBe(2500);
  });
});

describe('sittingAhead', () => {
  it('names the first sitting still to come, or the first when all are over', () => {
    const sittings = [
      { start: '2027-03-02T16:00:00Z', end: '2027-03-02T22:00:00Z' },
      { start: '2027-03-05T16:00:00Z', end: '2027-03-05T19:00:00Z' },
    ];
    expect(sittingAhead(sittings, new Date('2027-03-01T00:00:00Z'))).toBe(sittings[0]);
    expect(sittingAhead(sittings, new Date('2027-03-03T00:00:00Z'))).toBe(sittings[1]);
    expect(sittingAhead(sittings, new Date('2027-04-01T00:00:00Z'))).toBe(sittings[0]);
  });
});
