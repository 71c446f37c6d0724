import { DateTime } from 'luxon';
import { useEffect, useState } from 'react';

/** The current time, updated every `everyMs` (developing timers, the online hold countdown). */
export function useNow(everyMs = 15_000): DateTime {
  const [now, setNow] = useState(() => DateTime.now());
  useEffect(() => {
    const id = window.setInterval(() => setNow(DateTime.now()), everyMs);
    return () => window.clearInterval(id);
  }, [everyMs]);
  return now;
}
