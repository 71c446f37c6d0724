import type { Salon } from '@shared/schemas/salon.schemas';
import type { Db } from '@server/db/database';
import type { JsonText } from '@server/lib/json-text';
import type { ReadCache } from '@server/lib/read-cache';
import { salonAtBookVersion } from '../book-version';
import { cachedBookRead } from '../book-version';
import { freeTimes, freeTimesDays, freeTimesKey, onlineService } from './availability.service';

/** The salon as the free-times search reads it. */
export const searchedSalon = (salon: Pick<Salon, 'id' | 'timeZone' | 'granularityMinutes'>) => ({
  id: salon.id,
  time_zone: salon.timeZone,
  granularity_minutes: salon.granularityMinutes,
});

/**
 * The public free times for an online-bookable service, answered from the read cache while the book over the
 * searched dates stands still. The service is checked inside: a refusal (not online, not found) is not cached,
 * and services are part of the version.
 */
export async function cachedFreeTimes(
  db: Db,
  cache: ReadCache,
  slug: string,
  ask: { serviceId: string; stylistId?: string; from?: string },
  now: Date,
): Promise<JsonText> {
  const at = await salonAtBookVersion(db, { slug }, (zone) => freeTimesDays(zone, ask.from, now));
  const salon = searchedSalon(at.salon);
  return cachedBookRead(cache, at, freeTimesKey(salon, ask.serviceId, ask.stylistId, ask.from, now), async () =>
    freeTimes(db, salon, await onlineService(db, salon.id, ask.serviceId), ask.stylistId, ask.from, now),
  );
}
