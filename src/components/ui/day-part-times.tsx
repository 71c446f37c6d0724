import { useId, useState } from 'react';
import { dayPartNames, spreadTimes, type DayPart } from '@client/lib/day-parts';
import { freeTimeKey, type FreeTime } from '@client/lib/free-times';
import { Button } from './button';
import { FreeTimeButton } from './free-time-button';

/** How many times a part of the day shows before "more": about a phone screen's worth across the three parts. */
const AT_A_GLANCE = 8;

type Props = { part: DayPart; times: FreeTime[]; timeZone: string; selectedKey: string | null; onSelect: (time: FreeTime) => void; showStylist: boolean };

/**
 * One part of a day's free times: a short list spread over it, and "more" for every time. The picked time stays
 * listed when the list is short again, so the choice never disappears from view.
 */
export function DayPartTimes({ part, times, timeZone, selectedKey, onSelect, showStylist }: Props) {
  const headingId = useId();
  const [all, setAll] = useState(false);
  const glance = spreadTimes(times, timeZone, AT_A_GLANCE);
  const picked = times.find((t) => freeTimeKey(t) === selectedKey);
  const short = picked && !glance.includes(picked) ? times.filter((t) => t === picked || glance.includes(t)) : glance;
  const shown = all ? times : short;
  const name = dayPartNames[part];
  return (
    <div role="group" aria-labelledby={headingId} className="flex flex-col gap-2">
      <h4 id={headingId} className="flex items-baseline gap-2">
        <span className="font-bold">{name}</span>
        <span className="text-sm text-ink/80 tabular">{times.length} free</span>
      </h4>
      <ul className="grid grid-cols-3 gap-2 sm:grid-cols-4">
        {shown.map((time) => (
          <li key={freeTimeKey(time)}>
            <FreeTimeButton time={time} timeZone={timeZone} selectedKey={selectedKey} onSelect={onSelect} showStylist={showStylist} />
          </li>
        ))}
      </ul>
      {times.length > short.length && (
        <Button variant="secondary" className="self-start" aria-expanded={all} onClick={() => setAll(!all)}>
          {all ? `Fewer ${name.toLowerCase()} times` : `More ${name.toLowerCase()} times (${times.length - short.length} more)`}
        </Button>
      )}
    </div>
  );
}
