import { replanApi } from '@shared/api/replan.api';
import { apiQuery } from '@client/lib/api-client';

/**
 * How long until the day is read again: just after the answer's `recheckAt`, when a step that simply runs on (nobody
 * tapping) starts to push the rest of the day, and at least once a minute. Counted in the server's own clock (from
 * the answer's `asOf`), so a device whose clock is off still asks at the right moment.
 */
function untilRecheck(query: { state: { data?: { asOf: string; recheckAt: string | null }; dataUpdatedAt: number } }): number {
  const data = query.state.data;
  if (!data?.recheckAt) return 60_000;
  const wait = Date.parse(data.recheckAt) - Date.parse(data.asOf) - (Date.now() - query.state.dataUpdatedAt) + 200;
  return Math.min(60_000, Math.max(500, wait));
}

export const replanQueries = {
  /** The day's conflicts from overruns. A tap anywhere reaches it through the live stream; a step that runs on, at its recheck. */
  day: (date?: string) => ({ ...apiQuery(replanApi.dayConflicts, { query: { date } }), refetchInterval: untilRecheck }),
  /** The signed-in stylist's day as it now runs (My day's times), read again like the desk's conflicts. */
  stylistRun: (date?: string) => ({ ...apiQuery(replanApi.stylistDayRun, { query: { date } }), refetchInterval: untilRecheck }),
};
