import { urlOf } from '@shared/api/endpoint';
import { utilisationApi } from '@shared/api/utilisation.api';
import type { UtilisationQuery } from '@shared/schemas/utilisation.schemas';
import { apiQuery } from '@client/lib/api-client';

const params = (q: UtilisationQuery) => ({ period: q.period, date: q.date, from: q.from, to: q.to });

export const utilisationQueries = {
  owner: (q: UtilisationQuery) => apiQuery(utilisationApi.owner, { query: params(q) }),
  desk: (q: UtilisationQuery) => apiQuery(utilisationApi.desk, { query: params(q) }),
};

/** The scenario export's address (a file download, so a plain link rather than a query). */
export const scenarioExportUrl = (q: UtilisationQuery) => urlOf(utilisationApi.scenario, { query: params(q) });

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
