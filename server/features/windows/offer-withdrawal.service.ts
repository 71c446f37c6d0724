import type { Db } from '../../db/database';
import { findService } from '../services/services.repository';
import { loadSalonCalendars } from '../planning/salon-calendars.repository';
import { planExactlyAt } from '../planning/plan-at';
import { listOpenOffers, setOfferStatus } from './window-offers.repository';
import { planOfferGone } from './offer-messages';
import { localDateOf, shiftLocalDate } from '../../../shared/time/salon-time';

const DAY = 86_400_000;

/**
 * After the book changed for a stylist between `from` and `to`, withdraws their open window offers that the
 * engine no longer places (the window was filled, booked or moved into): each becomes "gone" at once, so its
 * link stops offering a time the stylist cannot give, and its client is told. Runs in the changing transaction,
 * after the change, so it sees the book as it will be committed.
 */
export async function withdrawStaleOffers(
  db: Db,
  salon: { id: string; name: string; timeZone: string },
  stylistId: string,
  span: { from: Date; to: Date },
  now: Date,
): Promise<void> {
  // An offer's fit may start up to a day before the change and still reach into it (fits are short).
  const open = await listOpenOffers(db, stylistId, new Date(span.from.getTime() - DAY), span.to);
  const live = open.filter((o) => o.startsAt > now);
  if (live.length === 0) return;
  const day = (d: Date) => localDateOf(d, salon.timeZone);
  const calendars = await loadSalonCalendars(db, salon.id, { from: day(live[0].startsAt), to: shiftLocalDate(day(live[live.length - 1].startsAt), 1) });
  for (const offer of live) {
    const service = await findService(db, salon.id, offer.serviceId);
    const fits = service && !('reason' in planExactlyAt(calendars, { skill: service.skill, stylistId, plan: service.stepPlan, start: offer.startsAt }));
    if (fits) continue;
    await setOfferStatus(db, [offer.id], 'gone');
    await planOfferGone(db, {
      offerId: offer.id, salonId: salon.id, to: { id: offer.clientId, name: offer.clientName }, salonName: salon.name,
      serviceName: offer.serviceName, stylistName: offer.stylistName, start: offer.startsAt, timeZone: salon.timeZone,
    }, now);
  }
}
