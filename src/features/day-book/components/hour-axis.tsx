import { formatClock } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { COLUMN_HEADER_CLASS, PX_PER_MIN } from './timeline-scale';

type Props = { firstHour: number; lastHour: number; timeZone: string };

/** Hour marks down the left of the timeline, in the salon's zone. */
export function HourAxis({ firstHour, lastHour, timeZone }: Props) {
  const hours = Array.from({ length: lastHour - firstHour + 1 }, (_, i) => firstHour + i);
  const label = (hour: number) => formatClock(`${String(hour).padStart(2, '0')}:00`, formatFor(timeZone), { hourOnly: true });
  return (
    <div aria-hidden="true" className="sticky left-0 z-10 w-16 shrink-0 border-r border-ink/15 bg-white">
      <div className={COLUMN_HEADER_CLASS} />
      <div className="relative" style={{ height: (lastHour - firstHour) * 60 * PX_PER_MIN }}>
        {hours.map((hour) => (
          <span key={hour} className="absolute right-2 -translate-y-1/2 text-xs tabular text-ink/80" style={{ top: (hour - firstHour) * 60 * PX_PER_MIN }}>
            {label(hour)}
          </span>
        ))}
      </div>
    </div>
  );
}
