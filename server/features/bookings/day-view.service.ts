import { DateTime } from 'luxon';
import type { Db } from '@server/db/database';
import type { DayView, WeekView } from '@shared/schemas/booking-view.schemas';
import type { Salon } from '@shared/schemas/salon.schemas';
import { AppError } from '@server/lib/app-error';
import { openingDays } from '@shared/engine/opening-days';
import { listSalonHours } from '../salon';
import { loadBookingViews } from './booking-views.service';
import { listChairs, listStylists, findStaffIdForUser } from './salon-resources.repository';
import { instantAt, localDateOf, shiftLocalDate } from '@shared/time/salon-time';

/** [start, end) of a local date in the salon's zone: 23, 24 or 25 real hours. */
export function localDayBounds(date: string, timeZone: string): { from: Date; to: Date } {
  const from = instantAt(date, timeZone);
  if (!from) throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { date: 'Not a calendar date.' });
  return { from, to: instantAt(shiftLocalDate(date, 1), timeZone)! };
}

/** Today in the salon by the server's clock (the routes' default date). */
export function todayIn(timeZone: string, now = new Date()): string {
  return localDateOf(now, timeZone);
}

/** The salon's opening hours over `count` dates from `date`: what the day book and the week cover. */
async function openingOver(db: Db, salon: Salon, date: string, count: number) {
  return openingDays(await listSalonHours(db, salon.id), salon.timeZone, date, count);
}

/** The whole salon's book for one day (front desk and owner). */
export async function deskDay(db: Db, salon: Salon, date = todayIn(salon.timeZone)): Promise<DayView> {
  const bounds = localDayBounds(date, salon.timeZone);
  const [stylists, chairs, bookings, [opening]] = await Promise.all([
    listStylists(db, salon.id),
    listChairs(db, salon.id),
    loadBookingViews(db, { salonId: salon.id, ...bounds }, salon.timeZone),
    openingOver(db, salon, date, 1),
  ]);
  return { date, timeZone: salon.timeZone, currency: salon.currency, hours: opening?.hours ?? [], stylists, chairs, bookings };
}

/** One stylist's own day: only the bookings they work on. */
export async function stylistDay(db: Db, salon: Salon, userId: string, date = todayIn(salon.timeZone)): Promise<DayView> {
  const staffId = await findStaffIdForUser(db, userId);
  if (!staffId) throw new AppError('NOT_FOUND', 404, 'No stylist profile is linked to this account.');
  const bounds = localDayBounds(date, salon.timeZone);
  const [stylists, chairs, bookings, [opening]] = await Promise.all([
    listStylists(db, salon.id),
    listChairs(db, salon.id),
    loadBookingViews(db, { salonId: salon.id, stylistId: staffId, ...bounds }, salon.timeZone),
    openingOver(db, salon, date, 1),
  ]);
  return {
    date,
    timeZone: salon.timeZone,
    currency: salon.currency,
    hours: opening?.hours ?? [],
    stylists: stylists.filter((s) => s.id === staffId),
    chairs,
    bookings,
  };
}

/** The Monday (ISO week start) of the week holding a local date. */
export function mondayOf(date: string): string {
  const day = DateTime.fromISO(date, { zone: 'UTC' });
  if (!day.isValid) throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { date: 'Not a calendar date.' });
  return day.startOf('week').toISODate()!;
}

/** Monday to Sunday of the week holding `date`, for one stylist or all. */
export async function deskWeek(db: Db, salon: Salon, date = todayIn(salon.timeZone), stylistId?: string): Promise<WeekView> {
  const monday = DateTime.fromISO(mondayOf(date), { zone: salon.timeZone });
  const to = monday.plus({ days: 7 });
  const [all, bookings, days] = await Promise.all([
    listStylists(db, salon.id),
    loadBookingViews(db, { salonId: salon.id, stylistId, from: monday.toJSDate(), to: to.toJSDate() }, salon.timeZone),
    openingOver(db, salon, monday.toISODate()!, 7),
  ]);
  const stylists = all.filter((s) => !stylistId || s.id === stylistId);
  return { from: monday.toISODate()!, to: to.toISODate()!, timeZone: salon.timeZone, days, stylists, bookings };
}
