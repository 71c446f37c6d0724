import { replanApi } from '@shared/api/replan.api';
import { apiQuery } from '@client/lib/api-client';

export const replanQueries = {
  /**
   * The day's conflicts from overruns. A tap anywhere reaches it through the live stream; a step that simply runs on
   * with nobody tapping makes its overrun grow with the clock, so it is read again every minute too.
   */
  day: (date?: string) => ({ ...apiQuery(replanApi.dayConflicts, { query: { date } }), refetchInterval: 60_000 }),
};
