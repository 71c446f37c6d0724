import type { BookingStatus } from '@shared/schemas/common.schemas';
import type { DeskCheckout } from '@shared/schemas/desk-checkout.schemas';
import type { VisitFacts } from './checkouts.repository';

/**
 * When a visit can be checked out: once the client has arrived for every sitting (none is still to come), whether or
 * not the stylist has tapped the last step finished. The client pays on the way out, often before the last tap; a
 * correction in two sittings is paid once, at its last sitting.
 */
export function notReadyReason(status: BookingStatus, sittings: VisitFacts['sittingStatuses']): string | null {
  if (status === 'checked_out') return 'This visit is checked out already.';
  if (status === 'cancelled' || status === 'no_show' || status === 'held') return `A ${status.replace('_', '-')} booking has nothing to check out.`;
  if (status === 'booked' && sittings.every((s) => s === 'booked')) return 'The client has not arrived yet: mark the arrival first.';
  if (sittings.includes('booked')) return 'A sitting of this visit is still to come: check out at the last one.';
  return null;
}

/** The visit's service lines as the desk sees them: a "from" price with the range it may be set in. */
export function serviceLinesOf(f: VisitFacts): DeskCheckout['services'] {
  if (!f.priceIsFrom) return [{ label: f.serviceName, priceCents: f.bookedCents, upToCents: null }];
  // The range starts at the menu's "from" price and runs up to what the client was quoted (the booking's price).
  return [{ label: f.serviceName, priceCents: f.menuCents, upToCents: Math.max(f.menuCents, f.bookedCents) }];
}
