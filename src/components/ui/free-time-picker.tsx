import { useState } from 'react';
import { groupTimesByPart } from '@client/lib/day-parts';
import { dayLabel, groupTimesByDay, oneTimePerStart, type FreeTime } from '@client/lib/free-times';
import { Button } from './button';
import { DayChips } from './day-chips';
import { DayPartTimes } from './day-part-times';

const DAYS_AT_A_TIME = 7;

type Props = {
  times: FreeTime[];
  timeZone: string;
  selectedKey: string | null;
  onSelect: (time: FreeTime) => void;
  /** Asks for the weeks after the last day listed; shown once every listed day is visible. */
  onLater?: () => void;
  /**
   * The client asked for any stylist: each start is one choice (whoever is free then, named on the button), not one
   * button per stylist.
   */
  showStylist: boolean;
};

/**
 * Free times as day chips (a week at a time, "Show later days" for more) and the chosen day's times by part of the
 * day, each a short spread list with "more". Days and parts are the salon's, whatever the device's zone.
 */
export function FreeTimePicker({ times, timeZone, selectedKey, onSelect, onLater, showStylist }: Props) {
  const days = groupTimesByDay(showStylist ? oneTimePerStart(times) : times, timeZone);
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
      <section aria-label={`Free times on ${dayLabel(day.date)}`} className="flex flex-col gap-4">
        <h3 className="text-lg font-bold">{dayLabel(day.date)}</h3>
        {groupTimesByPart(day.times, timeZone).map(({ part, times: partTimes }) => (
          <DayPartTimes
            key={`${day.date}|${part}`}
            part={part}
            times={partTimes}
            timeZone={timeZone}
            selectedKey={selectedKey}
            onSelect={onSelect}
            showStylist={showStylist}
          />
        ))}
      </section>
    </div>
  );
}
