import { useSuspenseQuery } from '@tanstack/react-query';
import { useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { takingsQueries } from '@client/features/takings/api/takings-queries';
import { TakingsView } from '@client/features/takings/components/takings-view';
import { paths } from '@client/config/paths';
import { queryClient } from '@client/lib/query-client';
import { todayIn } from '@client/lib/time';
import { dateParam, dateParamOf } from '../date-param';

export async function loader({ request }: LoaderFunctionArgs) {
  const salon = await queryClient.ensureQueryData(salonQueries.current());
  await queryClient.ensureQueryData(takingsQueries.day(dateParamOf(request) ?? todayIn(salon.timeZone)));
  return null;
}

/** The day's takings and its close; `?date=` picks the day (today in the salon when left out). */
export function Component() {
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  const date = dateParam(search) ?? todayIn(salon.timeZone);
  return <TakingsView key={date} date={date} hrefFor={paths.deskTakings} onPick={(d) => navigate(paths.deskTakings(d))} />;
}
