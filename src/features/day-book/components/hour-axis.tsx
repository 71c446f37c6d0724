import { DateTime } from 'luxon';
import { COLUMN_HEADER_CLASS, PX_PER_MIN } from './timeline-scale';

type Props = { firstHour: number; lastHour: number; date: string; timeZone: string };

/** Hour marks down the left of the timeline, in the salon's zone. */
export function HourAxis({ firstHour, lastHour, date, timeZone }: Props) {
  const hours = Array.from({ length: lastHour - firstHour + 1 }, (_, i) => firstHour + i);
  const label = (hour: number) =>
    DateTime.fromISO(date, { zone: timeZone }).set({ hour }).toLocaleString({ hour: 'numeric' });
  return (
    <div aria-hidden="true" className="sticky left-0 z-10 w-16 shrink-0 border-r border-ink/15 bg-white">
      <div className={COLUMN_HEADER_CLASS} />
      <div className="relative" style={{ height: (lastHour - firstHour) * 60 * PX_PER_MIN }}>
        {hours.map((hour) => (
          <span
            key={hour}
            className="absolute right-2 -translate-y-1/2 text-xs tabular text-ink/80"
            style={{ top: (hour - firstHour) * 60 * PX_PER_MIN }}
          >
            {label(hour)}
          </span>
        ))}
      </div>
    </div>
  );
}
