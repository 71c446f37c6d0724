/** Whole seconds from `nowMs` until `untilIso`, never below 0 (rounded up, so 0 means really over). */
export function secondsLeft(untilIso: string, nowMs: number): number {
  return Math.max(0, Math.ceil((Date.parse(untilIso) - nowMs) / 1000));
}

/** "9:05" — minutes and seconds of a countdown, as shown on the hold timer. */
export function formatCountdown(seconds: number): string {
  const whole = Math.max(0, Math.floor(seconds));
  return `${Math.floor(whole / 60)}:${String(whole % 60).padStart(2, '0')}`;
}

/** "9 minutes 5 seconds", "1 minute", "45 seconds": the countdown in words for screen readers. */
export function spokenCountdown(seconds: number): string {
  const whole = Math.max(0, Math.floor(seconds));
  const minutes = Math.floor(whole / 60);
  const rest = whole % 60;
  const parts = [];
  if (minutes > 0) parts.push(`${minutes} ${minutes === 1 ? 'minute' : 'minutes'}`);
  if (rest > 0 || minutes === 0) parts.push(`${rest} ${rest === 1 ? 'second' : 'seconds'}`);
  return parts.join(' ');
}

// A ticking timer read aloud every second would drown everything else out, so
// screen readers hear it only as it passes these marks.
const MARKS = [300, 120, 60] as const;

/** The last mark (in seconds) the countdown has reached, or null before the first; drives one polite announcement per mark. */
export function countdownMark(seconds: number): number | null {
  let reached: number | null = null;
  for (const mark of MARKS) if (seconds <= mark) reached = mark;
  return reached;
}
