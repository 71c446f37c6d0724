import type { DateTime } from 'luxon';
import { useEffect } from 'react';
import { chime } from './chime';
import { showNotice } from './notices';

export type DueAlert = { kind: 'least' | 'most_soon' | 'limit'; at: DateTime };

const titles: Record<DueAlert['kind'], string> = {
  least: 'Least time reached: can be checked',
  most_soon: '5 minutes to the most time',
  limit: 'Processing limit reached: rinse now',
};

// Raised once per page load and step moment, whichever screen (My day, the desk's day) shows the timer first.
const raised = new Set<string>();
/** An alert whose moment passed longer ago than this when the page opened is shown in the timer, not chimed. */
const STALE_MINUTES = 10;

/** Chimes and shows a notice for each alert whose moment has come, once each. */
export function useTimerAlerts(key: string, label: string, due: DueAlert[], now: DateTime): void {
  useEffect(() => {
    for (const alert of due) {
      const id = `${key}:${alert.kind}:${alert.at.toMillis()}`;
      if (raised.has(id)) continue;
      raised.add(id);
      if (now.diff(alert.at, 'minutes').minutes > STALE_MINUTES) continue;
      chime();
      showNotice(titles[alert.kind], label, id);
    }
  }, [key, label, due, now]);
}
