import { useEffect } from 'react';
import { useNow } from '@client/lib/use-now';
import { countdownMark, formatCountdown, secondsLeft, spokenCountdown } from '../countdown';

type Props = { heldUntil: string; onExpire: () => void };

/**
 * The hold's time left, ticking each second. Screen readers are told only at
 * the marks (5, 2 and 1 minute left), not every tick.
 */
export function HoldCountdown({ heldUntil, onExpire }: Props) {
  const seconds = secondsLeft(heldUntil, useNow(1000).toMillis());
  const mark = countdownMark(seconds);
  useEffect(() => {
    if (seconds === 0) onExpire();
  }, [seconds, onExpire]);
  return (
    <p className="flex flex-wrap items-baseline gap-x-2">
      <span>Held for you for</span>
      <span role="timer" aria-label={`${spokenCountdown(seconds)} left`} className={`text-xl font-extrabold tabular ${seconds <= 120 ? 'text-brick' : ''}`}>
        {formatCountdown(seconds)}
      </span>
      <span aria-live="polite" className="sr-only">
        {mark !== null && `${spokenCountdown(mark)} left to finish booking.`}
      </span>
    </p>
  );
}
