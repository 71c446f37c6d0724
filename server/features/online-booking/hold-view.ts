import type { Hold } from '@shared/schemas/online-booking.schemas';
import type { HoldRecord } from './holds.repository';
import { AppError } from '@server/lib/app-error';

/** What a client's screens show of a hold (or the booking it became); one past its time reads as lapsed. */
export function holdView(h: HoldRecord, now = new Date()): Hold {
  const lapsed = h.status === 'held' && h.heldUntil !== null && h.heldUntil <= now;
  return {
    holdId: h.id,
    status: h.status === 'held' ? (lapsed ? 'lapsed' : 'held') : 'booked',
    heldUntil: h.heldUntil?.toISOString() ?? null,
    salonName: h.salonName,
    serviceName: h.serviceName,
    stylistName: h.stylistName,
    start: h.start.toISOString(),
    end: h.end.toISOString(),
    timeZone: h.timeZone,
    depositCents: h.depositCents,
    currency: h.currency,
  };
}

/** A hold that is gone: its minutes ran out or the client released it; either way the time is free for others. */
export const holdLapsed = () => new AppError('HOLD_LAPSED', 409, 'The held time was released, so others can book it now. Please pick a time again.');
