import type { Db } from '@server/db/database';
import type { Salon } from '@shared/schemas/salon.schemas';
import type { HandsFreeWindowView, SentOffer } from '@shared/schemas/window.schemas';
import { replanDaysUnderWay, windowsOn } from '../planning';
import { listServices } from '../services';
import { listStandby } from '../standby';
import { standbyForWindow, windowFitServices } from './window-fits';
import { listDayOffers } from './window-offers.repository';
import { instantIso, localDateOf } from '@shared/time/salon-time';
import { listStylists, localDayBounds } from '../bookings';

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
  const freed = await freedWindows(db, salon, date, fits, now);
  const windows = await windowsOn(
    db,
    salon,
    date,
    fits.map((f) => ({ service: f.service.id, skill: f.service.skill, minutes: f.minutes })),
  );
  const shown = [...windows.map((w) => ({ ...w, freed: false })), ...freed].filter((w) => !stylistId || w.stylist === stylistId);
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
      freed: w.freed,
    };
  });
  const closedOffers = offers.filter((o) => !shown.some((w) => inWindow(o, w))).map(sent);
  return { windows: views, closedOffers };
}

/**
 * Today's freed minutes as windows: the minutes of a stylist's hands the re-plan finds freed from now on (an early
 * finish, a sitting that moved), with the fits the stylist has the skill for that are short enough for the stretch.
 */
async function freedWindows(db: Db, salon: Salon, date: string, fits: ReturnType<typeof windowFitServices>, now: Date) {
  if (date !== localDateOf(now, salon.timeZone)) return [];
  const [replans, stylists] = await Promise.all([replanDaysUnderWay(db, salon, now), listStylists(db, salon.id)]);
  const skills = new Map(stylists.map((s) => [s.id, s.skills]));
  return replans.flatMap((r) =>
    r.freed
      .filter((f) => f.minutes >= salon.granularityMinutes)
      .map((f) => ({
        stylist: r.stylistId,
        start: f.start,
        end: f.end,
        fits: fits.filter((fit) => fit.minutes <= f.minutes && (skills.get(r.stylistId) ?? []).includes(fit.service.skill)).map((fit) => fit.service.id),
        freed: true,
      })),
  );
}
