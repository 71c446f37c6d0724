import { DateTime } from 'luxon';

const minutesOf = (hhmm: string) => {
  // A missing part reads as NaN, as Number(undefined) would.
  const [h = NaN, m = NaN] = hhmm.split(':').map(Number);
  return h * 60 + m;
};

/**
 * Moves an SMS out of the salon's quiet hours to the next allowed time (the end of the quiet stretch), in
 * the salon's zone. Quiet hours may wrap midnight (21:00–08:00); equal ends mean no quiet hours.
 */
export function outOfQuietHours(at: Date, zone: string, quietFrom: string, quietTo: string): Date {
  const from = minutesOf(quietFrom);
  const to = minutesOf(quietTo);
  if (from === to) return at;
  const local = DateTime.fromJSDate(at, { zone });
  const now = local.hour * 60 + local.minute;
  const wraps = from > to;
  const quiet = wraps ? now >= from || now < to : now >= from && now < to;
  if (!quiet) return at;
  const day = wraps && now >= from ? local.startOf('day').plus({ days: 1 }) : local.startOf('day');
  return day.set({ hour: Math.floor(to / 60), minute: to % 60 }).toJSDate();
}

/**
 * When a reminder `hours` before `start` goes out. Whole days are counted on the salon's calendar, so a
 * 24 h reminder for a 10:00 sitting comes at 10:00 the day before even across a daylight-saving change
 * (the client reads it as "same time tomorrow"); other offsets are exact hours.
 */
export function reminderAt(start: Date, hours: number, zone: string): Date {
  const local = DateTime.fromJSDate(start, { zone });
  return (hours % 24 === 0 ? local.minus({ days: hours / 24 }) : local.minus({ hours })).toJSDate();
}
