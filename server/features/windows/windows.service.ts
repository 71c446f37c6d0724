import type { Db } from '@server/db/database';
import type { Salon } from '@shared/schemas/salon.schemas';
import type { HandsFreeWindowView, SentOffer } from '@shared/schemas/window.schemas';
import { windowsOn } from '../planning';
import { listServices } from '../services';
import { listStandby } from '../standby';
import { standbyForWindow, windowFitServices } from './window-fits';
import { listDayOffers } from './window-offers.repository';
import { instantIso } from '@shared/time/salon-time';
import { localDayBounds } from '../bookings';

/**
 * The day's hands-free windows (one stylist or all) with what fits, who on standby wants it and the offers sent
 * for it; offers whose window has closed since are listed apart, with what became of them.
 */
export async function listWindowViews(
  db: Db,
  salon: Salon,
  date: string,
  stylistId: string | undefined,
  now: Date,
): Promise<{ windows: HandsFreeWindowView[]; closedOffers: SentOffer[] }> {
  const { from: dayStart, to: dayEnd } = localDayBounds(date, salon.timeZone);
  const [services, standby, offerRows] = await Promise.all([
    listServices(db, salon.id),
    listStandby(db, salon.id),
    listDayOffers(db, salon.id, dayStart, dayEnd),
  ]);
  const offers = offerRows
    .filter((o) => !stylistId || o.stylistId === stylistId)
    .map((o) => ({
      stylistId: o.stylistId,
      start: instantIso(o.startsAt, salon.timeZone),
      at: o.startsAt.getTime(),
      clientName: o.clientName,
      serviceName: o.serviceName,
      status: o.status === 'offered' && o.expiresAt <= now ? ('expired' as const) : o.status,
    }));
  const inWindow = (o: (typeof offers)[number], w: { stylist: string; start: string; end: string }) =>
    o.stylistId === w.stylist && o.at >= Date.parse(w.start) && o.at < Date.parse(w.end);
  const sent = ({ at: _at, ...o }: (typeof offers)[number]): SentOffer => o;
  const fits = windowFitServices(services);
  const windows = await windowsOn(
    db,
    salon,
    date,
    fits.map((f) => ({ service: f.service.id, skill: f.service.skill, minutes: f.minutes })),
  );
  const shown = windows.filter((w) => !stylistId || w.stylist === stylistId);
  const views = shown.map((w) => {
    const fitting = fits.filter((f) => w.fits.includes(f.service.id));
    const wanted = standbyForWindow(standby, { stylistId: w.stylist, start: w.start, end: w.end, fitIds: w.fits }, salon.timeZone);
    return {
      stylistId: w.stylist,
      start: w.start,
      end: w.end,
      minutes: Math.round((Date.parse(w.end) - Date.parse(w.start)) / 60_000),
      fits: fitting.map((f) => ({ serviceId: f.service.id, name: f.service.name, minutes: f.minutes })),
      standby: wanted.map((e) => ({
        entryId: e.id,
        clientId: e.client.id,
        clientName: e.client.name,
        serviceIds: e.services.map((s) => s.id).filter((id) => w.fits.includes(id)),
      })),
      offers: offers.filter((o) => inWindow(o, w)).map(sent),
    };
  });
  const closedOffers = offers.filter((o) => !shown.some((w) => inWindow(o, w))).map(sent);
  return { windows: views, closedOffers };
}
