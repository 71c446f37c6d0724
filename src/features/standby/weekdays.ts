import { formatClock } from '@shared/format/date-time';
import { SALON_LOCALE } from '@shared/format/locale';

/** Weekday names, Monday first (the API numbers them 1 = Monday … 7 = Sunday). */
export const weekdayNames = ['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun'] as const;
export const weekdayLongNames = ['Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday', 'Sunday'] as const;

const clock = (hhmm: string) => formatClock(hhmm, { locale: SALON_LOCALE });

/** "Mon–Fri 9:00 AM – 12:00 PM" style text for one availability row. */
export function availabilityText(a: { weekdays: number[]; from: string; to: string }): string {
  const days = [...a.weekdays].sort((x, y) => x - y);
  const consecutive = days.length > 2 && days.every((d, i) => i === 0 || d === days[i - 1]! + 1);
  const dayText = consecutive ? `${weekdayNames[days[0]! - 1]}–${weekdayNames[days.at(-1)! - 1]}` : days.map((d) => weekdayNames[d - 1]).join(', ');
  return `${dayText} ${clock(a.from)} – ${clock(a.to)}`;
}
