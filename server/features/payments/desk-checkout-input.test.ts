import { describe, expect, it } from 'vitest';
import { notReadyReason, serviceLinesOf } from './desk-checkout-input';
import type { VisitFacts } from './checkouts.repository';

describe('when a visit can be checked out', () => {
  it('once the client has arrived for every sitting, before or after the last step is tapped', () => {
    expect(notReadyReason('checked_in', ['in_progress'])).toBeNull();
    expect(notReadyReason('finished', ['finished'])).toBeNull();
    expect(notReadyReason('finished', ['finished', 'no_show'])).toBeNull();
  });
  it('not before the client arrives, not between the sittings of a correction, never twice', () => {
    expect(notReadyReason('booked', ['booked'])).toMatch(/not arrived/);
    expect(notReadyReason('booked', ['finished', 'booked'])).toMatch(/still to come/);
    expect(notReadyReason('checked_out', ['finished'])).toMatch(/already/);
    expect(notReadyReason('cancelled', ['booked'])).toMatch(/nothing to check out/);
  });
});

describe("a visit's service lines", () => {
  const facts = { serviceName: 'Gloss', menuCents: 4500, bookedCents: 6500, priceIsFrom: true } as VisitFacts;
  it('a "from" price runs from the menu price up to the price quoted; a fixed one is the booked price', () => {
    expect(serviceLinesOf(facts)).toEqual([{ label: 'Gloss', priceCents: 4500, upToCents: 6500 }]);
    expect(serviceLinesOf({ ...facts, bookedCents: 4500 })).toEqual([{ label: 'Gloss', priceCents: 4500, upToCents: 4500 }]);
    expect(serviceLinesOf({ ...facts, priceIsFrom: false })).toEqual([{ label: 'Gloss', priceCents: 6500, upToCents: null }]);
  });
});
