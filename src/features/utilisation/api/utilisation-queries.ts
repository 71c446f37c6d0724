import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { DeskUtilisationSchema, OwnerUtilisationSchema, type UtilisationQuery } from '../../../../shared/schemas/utilisation.schemas';
import { apiGet, withQuery } from '../../../lib/api-client';

const params = (q: UtilisationQuery) => ({ period: q.period, date: q.date, from: q.from, to: q.to });

export const utilisationQueries = {
  all: () => ['utilisation'] as const,
  owner: (q: UtilisationQuery) =>
    queryOptions({
      queryKey: [...utilisationQueries.all(), 'owner', params(q)] as const,
      queryFn: () => apiGet(withQuery(apiPaths.ownerUtilisation, params(q)), OwnerUtilisationSchema),
    }),
  desk: (q: UtilisationQuery) =>
    queryOptions({
      queryKey: [...utilisationQueries.all(), 'desk', params(q)] as const,
      queryFn: () => apiGet(withQuery(apiPaths.deskUtilisation, params(q)), DeskUtilisationSchema),
    }),
};

/** The scenario export's address (a file download, so a plain link rather than a query). */
export const scenarioExportUrl = (q: UtilisationQuery) => withQuery(apiPaths.ownerUtilisationScenario, params(q));

/** The query a page's URL names (`?period=&date=&from=&to=`), week by default. */
export function queryFromSearch(search: URLSearchParams): UtilisationQuery {
  const period = search.get('period');
  return {
    period: period === 'day' || period === 'month' || period === 'custom' ? period : 'week',
    date: search.get('date') ?? undefined,
    from: search.get('from') ?? undefined,
    to: search.get('to') ?? undefined,
  };
}
