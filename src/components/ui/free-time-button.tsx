import { freeTimeKey, freeTimeLabel, type FreeTime } from '@client/lib/free-times';
import { formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

type Props = { time: FreeTime; timeZone: string; selectedKey: string | null; onSelect: (time: FreeTime) => void; showStylist: boolean };

/** One free time as a toggle button, announced with its day and stylist. */
export function FreeTimeButton({ time, timeZone, selectedKey, onSelect, showStylist }: Props) {
  return (
    <button
      type="button"
      aria-pressed={freeTimeKey(time) === selectedKey}
      aria-label={freeTimeLabel(time, timeZone)}
      onClick={() => onSelect(time)}
      className="flex min-h-11 w-full flex-col items-center justify-center rounded-lg border border-edge bg-white px-2 py-1 hover:border-ink aria-pressed:border-2 aria-pressed:border-oxide aria-pressed:bg-linen aria-pressed:font-bold"
    >
      <span className="tabular">{formatTime(time.start, formatFor(timeZone))}</span>
      {showStylist && <span className="text-xs">{time.stylistName}</span>}
    </button>
  );
}
