import type { HandsFreeWindowView } from '@shared/schemas/window.schemas';
import { minutesBetween } from '@client/lib/time';
import { formatRange } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { minutesIntoDay } from '@shared/time/salon-time';
import { PX_PER_MIN } from './timeline-scale';

type Props = { window: HandsFreeWindowView; date: string; firstHour: number; timeZone: string };

/** A hands-free window in the gutter of its stylist's column: a light dashed band with its length. */
export function WindowBand({ window: win, date, firstHour, timeZone }: Props) {
  const top = (minutesIntoDay(win.start, date, timeZone) - firstHour * 60) * PX_PER_MIN;
  const height = Math.max(minutesBetween(win.start, win.end) * PX_PER_MIN, 24);
  return (
    <li
      className="absolute inset-x-1 overflow-hidden rounded-md border-2 border-dashed border-sage bg-white px-1 text-xs leading-tight"
      style={{ top, height }}
    >
      {/* Minutes first: a short band has room for one line only. */}
      <span className="sr-only">Hands free </span>
      <span className="font-bold tabular">{win.minutes} min</span> <span aria-hidden="true">hands free</span>
      <span className="sr-only">, {formatRange(win.start, win.end, formatFor(timeZone))}</span>
    </li>
  );
}
