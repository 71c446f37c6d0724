import { useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { SectionCard } from '../../components/ui/section-card';
import { paths } from '../../config/paths';
import { ClientSearch } from '../../features/clients/components/client-search';
import { dayQueries } from '../../features/day-book/api/day-queries';
import { DayBookView } from '../../features/day-book/components/day-book-view';
import { formatLocalDate } from '../../lib/time';
import { queryClient } from '../../lib/query-client';
import { dateParam, dateParamOf } from '../date-param';

export async function loader({ request }: LoaderFunctionArgs) {
  await queryClient.ensureQueryData(dayQueries.desk(dateParamOf(request)));
  return null;
}

export function Component() {
  const [search] = useSearchParams();
  const { data: day } = useSuspenseQuery(dayQueries.desk(dateParam(search)));
  return (
    <DayBookView
      day={day}
      title={(isToday) => (isToday ? "Today's book" : `Book for ${formatLocalDate(day.date)}`)}
      hrefFor={paths.desk}
    >
      <SectionCard title="Clients">
        <ClientSearch />
      </SectionCard>
    </DayBookView>
  );
}
