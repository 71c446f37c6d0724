import { useState } from 'react';
import { dayLabel, freeTimeKey, freeTimeLabel, groupTimesByDay, type FreeTime } from '../../lib/free-times';
import { formatTime } from '../../lib/time';
import { Button } from './button';
import { DayChips } from './day-chips';

const DAYS_AT_A_TIME = 7;

type Props = {
  times: FreeTime[];
  timeZone: string;
  selectedKey: string | null;
  onSelect: (time: FreeTime) => void;
  /** Asks for the weeks after the last day listed; shown once every listed day is visible. */
  onLater?: () => void;
  /** Whether to name the stylist on each time (when the client asked for any stylist). */
  showStylist: boolean;
};

/**
 * Free times as day chips (a week at a time, "Show later days" for more) and the
 * chosen day's times as toggle buttons. Days are the salon's, whatever the device's zone.
 */
export function FreeTimePicker({ times, timeZone, selectedKey, onSelect, onLater, showStylist }: Props) {
  const days = groupTimesByDay(times, timeZone);
  const [shown, setShown] = useState(DAYS_AT_A_TIME);
  const [chosenDay, setChosenDay] = useState<string | null>(null);
  const day = days.find((d) => d.date === chosenDay) ?? days[0];

  if (!day) return <p>No free times in these weeks. Please call the salon, or try another stylist.</p>;
  const allShown = shown >= days.length;
  return (
    <div className="flex flex-col gap-4">
      <DayChips days={days.slice(0, shown)} selected={day.date} onSelect={setChosenDay} />
      {(!allShown || onLater) && (
        <Button variant="secondary" className="self-start" onClick={() => (allShown ? onLater?.() : setShown(shown + DAYS_AT_A_TIME))}>
          {allShown ? 'Look further ahead' : 'Show later days'}
        </Button>
      )}
      <section aria-label={`Free times on ${dayLabel(day.date)}`}>
        <h3 className="mb-2 text-lg font-bold">{dayLabel(day.date)}</h3>
        <ul className="grid grid-cols-2 gap-2 sm:grid-cols-4">
          {day.times.map((time) => {
            const key = freeTimeKey(time);
            return (
              <li key={key}>
                <button
                  type="button"
                  aria-pressed={key === selectedKey}
                  aria-label={freeTimeLabel(time, timeZone)}
                  onClick={() => onSelect(time)}
                  className="flex min-h-11 w-full flex-col items-center rounded-lg border border-ink/30 bg-white px-2 py-1 hover:border-ink/60 aria-pressed:border-2 aria-pressed:border-oxide aria-pressed:bg-linen aria-pressed:font-bold"
                >
                  <span className="tabular">{formatTime(time.start, timeZone)}</span>
                  {showStylist && <span className="text-xs">{time.stylistName}</span>}
                </button>
              </li>
            );
          })}
        </ul>
      </section>
    </div>
  );
}
