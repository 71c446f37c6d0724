import { DateTime } from 'luxon';
import type { Db } from '../../db/database';
import type { Salon } from '../../../shared/schemas/salon.schemas';
import type { HandsFreeWindowView } from '../../../shared/schemas/window.schemas';
import { findWindows } from '../../../shared/engine/engine';
import { loadSalonCalendars } from '../planning/salon-calendars.repository';
import { listServices } from '../services/services.repository';
import { listStandby } from '../standby/standby.repository';
import { standbyForWindow, windowFitServices } from './window-fits';

/** The day's hands-free windows (one stylist or all) with what fits and who on standby wants it. */
export async function listWindowViews(db: Db, salon: Salon, date: string, stylistId?: string): Promise<HandsFreeWindowView[]> {
  const next = DateTime.fromISO(date).plus({ days: 1 }).toISODate()!;
  const [calendars, services, standby] = await Promise.all([
    loadSalonCalendars(db, salon.id, { from: date, to: next }),
    listServices(db, salon.id),
    listStandby(db, salon.id),
  ]);
  const fits = windowFitServices(services);
  const { windows } = findWindows({ ...calendars, fits: fits.map((f) => ({ service: f.service.id, skill: f.service.skill, minutes: f.minutes })) });
  return windows
    .filter((w) => !stylistId || w.stylist === stylistId)
    .map((w) => {
      const fitting = fits.filter((f) => w.fits.includes(f.service.id));
      const wanted = standbyForWindow(standby, { stylistId: w.stylist, start: w.start, end: w.end, fitIds: w.fits }, salon.timeZone);
      return {
        stylistId: w.stylist,
        start: w.start,
        end: w.end,
        minutes: Math.round((Date.parse(w.end) - Date.parse(w.start)) / 60_000),
        fits: fitting.map((f) => ({ serviceId: f.service.id, name: f.service.name, minutes: f.minutes })),
        standby: wanted.map((e) => ({ entryId: e.id, clientId: e.client.id, clientName: e.client.name, serviceIds: e.services.map((s) => s.id).filter((id) => w.fits.includes(id)) })),
      };
    });
}
