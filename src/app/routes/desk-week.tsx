import { useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { IdSchema } from '../../../shared/schemas/common.schemas';
import { catalogueQueries } from '../../features/catalogue/api/catalogue-queries';
import { weekQueries } from '../../features/week/api/week-queries';
import { WeekPage } from '../../features/week/components/week-page';
import { queryClient } from '../../lib/query-client';
import { dateParam } from '../date-param';

/** The `?stylist=` of the week page, or the first stylist on the list. */
function stylistParam(search: URLSearchParams, stylists: { id: string }[]): string | undefined {
  const asked = IdSchema.safeParse(search.get('stylist'));
  return asked.success ? asked.data : stylists[0]?.id;
}

export async function loader({ request }: LoaderFunctionArgs) {
  const search = new URL(request.url).searchParams;
  const { stylists } = await queryClient.ensureQueryData(catalogueQueries.stylists());
  await queryClient.ensureQueryData(weekQueries.desk(dateParam(search), stylistParam(search, stylists)));
  return null;
}

export function Component() {
  const [search] = useSearchParams();
  const { data: stylists } = useSuspenseQuery(catalogueQueries.stylists());
  const stylistId = stylistParam(search, stylists.stylists);
  const { data: week } = useSuspenseQuery(weekQueries.desk(dateParam(search), stylistId));
  if (!stylistId) return <p>No stylists are set up yet.</p>;
  return <WeekPage week={week} stylistId={stylistId} stylists={stylists.stylists} />;
}
