import { formatPercent } from '@client/lib/booking-labels';
import { formatClock } from '@shared/format/date-time';
import { SALON_LOCALE } from '@shared/format/locale';

const WEEKDAYS = ['', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday', 'Sunday'];
/** The name of an API weekday (1 = Monday … 7 = Sunday); empty for anything else. */
export const weekdayName = (weekday: number | undefined) => (weekday === undefined ? '' : (WEEKDAYS[weekday] ?? ''));
/** An hour of the salon's day as its clock reads it: "9 AM", "1 PM". */
export const hourLabel = (hour: number) => formatClock(`${String(hour).padStart(2, '0')}:00`, { locale: SALON_LOCALE }, { hourOnly: true });
export const percentText = (share: number | null | undefined) => formatPercent(share ?? null);
/** A share as a rounded percentage number for charts (null stays a gap). */
export const percentValue = (share: number | null) => (share === null ? null : Math.round(share * 1000) / 10);
/** Hours to one decimal ("7.5 h"), for chair time planned and actual. */
export const hoursText = (hours: number) => `${new Intl.NumberFormat(SALON_LOCALE, { maximumFractionDigits: 1 }).format(hours)} h`;
/** A figure rounded for a CSV cell (hours to 2 decimals, minutes to 1); null stays empty. */
export const rounded = (value: number | null, decimals: number) => (value === null ? null : Number(value.toFixed(decimals)));
