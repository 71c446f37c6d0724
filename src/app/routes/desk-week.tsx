import { useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { IdSchema } from '@shared/schemas/common.schemas';
import { catalogueQueries } from '@client/features/catalogue/api/catalogue-queries';
import { weekQueries } from '@client/features/week/api/week-queries';
import { WeekPage } from '@client/features/week/components/week-page';
import { queryClient } from '@client/lib/query-client';
import { dateParam } from '../date-param';

/** The `?stylist=` of the week page, or undefined for all stylists together. */
function stylistParam(search: URLSearchParams): string | undefined {
  const asked = IdSchema.safeParse(search.get('stylist'));
  return asked.success ? asked.data : undefined;
}

export async function loader({ request }: LoaderFunctionArgs) {
  const search = new URL(request.url).searchParams;
  await Promise.all([
    queryClient.ensureQueryData(catalogueQueries.stylists()),
    queryClient.ensureQueryData(weekQueries.desk(dateParam(search), stylistParam(search))),
  ]);
  return null;
}

export function Component() {
  const [search] = useSearchParams();
  const { data: stylists } = useSuspenseQuery(catalogueQueries.stylists());
  const stylistId = stylistParam(search);
  const { data: week } = useSuspenseQuery(weekQueries.desk(dateParam(search), stylistId));
  return <WeekPage week={week} stylistId={stylistId ?? null} stylists={stylists.stylists} />;
}
