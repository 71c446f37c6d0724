import type { Db } from '@server/db/database';
import { findService } from '../services';
import { exactPlan, type PlanningSalon } from '../planning';
import { listOpenOffers, setOfferStatus } from './window-offers.repository';
import { planOfferGone } from './offer-messages';

const DAY = 86_400_000;

/**
 * After the book changed for a stylist between `from` and `to`, withdraws their open window offers that the
 * engine no longer places (the window was filled, booked or moved into): each becomes "gone" at once, so its
 * link stops offering a time the stylist cannot give, and its client is told. Runs in the changing transaction,
 * after the change, so it sees the book as it will be committed.
 */
export async function withdrawStaleOffers(
  db: Db,
  salon: PlanningSalon & { name: string },
  stylistId: string,
  span: { from: Date; to: Date },
  now: Date,
): Promise<void> {
  // An offer's fit may start up to a day before the change and still reach into it (fits are short).
  const open = await listOpenOffers(db, stylistId, new Date(span.from.getTime() - DAY), span.to);
  const live = open.filter((o) => o.startsAt > now);
  if (live.length === 0) return;
  const services = await Promise.all(live.map((o) => findService(db, salon.id, o.serviceId)));
  const asked = live.flatMap((offer, i) => {
    const service = services[i];
    return service ? [{ offer, placement: { skill: service.skill, stylistId, plan: service.stepPlan, start: offer.startsAt } }] : [];
  });
  const placed = await exactPlan(
    db,
    salon,
    asked.map((a) => a.placement),
  );
  const still = new Set(asked.filter((_, i) => 'plan' in placed[i]!).map((a) => a.offer.id)); // one answer per placement
  for (const offer of live) {
    if (still.has(offer.id)) continue;
    await setOfferStatus(db, [offer.id], 'gone');
    await planOfferGone(
      db,
      {
        offerId: offer.id,
        salonId: salon.id,
        to: { id: offer.clientId, name: offer.clientName },
        salonName: salon.name,
        serviceName: offer.serviceName,
        stylistName: offer.stylistName,
        start: offer.startsAt,
        timeZone: salon.timeZone,
      },
      now,
    );
  }
}
