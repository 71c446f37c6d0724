import { shortDayLabel, dayLabel, type FreeDay } from '@client/lib/free-times';

type Props = { days: FreeDay[]; selected: string; onSelect: (date: string) => void };

/** One chip per day that has free times; the pressed chip's times show below. Wraps on a phone. */
export function DayChips({ days, selected, onSelect }: Props) {
  return (
    <ul aria-label="Days with free times" className="flex flex-wrap gap-2">
      {days.map((day) => (
        <li key={day.date}>
          <button
            type="button"
            aria-pressed={day.date === selected}
            aria-label={`${dayLabel(day.date)}, ${day.times.length} free ${day.times.length === 1 ? 'time' : 'times'}`}
            onClick={() => onSelect(day.date)}
            className="flex min-h-11 min-w-20 flex-col items-center rounded-lg border border-edge bg-white px-3 py-1 text-sm hover:border-ink aria-pressed:border-2 aria-pressed:border-oxide aria-pressed:bg-linen aria-pressed:font-bold"
          >
            <span>{shortDayLabel(day.date)}</span>
            <span className="text-xs text-ink/80 tabular">{day.times.length} free</span>
          </button>
        </li>
      ))}
    </ul>
  );
}
