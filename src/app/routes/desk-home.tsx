import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { SectionCard } from '@client/components/ui/section-card';
import { paths } from '@client/config/paths';
import { ClientSearch } from '@client/features/clients/components/client-search';
import { dayQueries } from '@client/features/day-book/api/day-queries';
import { DayBookView } from '@client/features/day-book/components/day-book-view';
import { ArrivalsList } from '@client/features/day-book/components/arrivals-list';
import { RunningLatePanel } from '@client/features/replan';
import { windowQueries } from '@client/features/windows/api/window-queries';
import { formatDate } from '@shared/format/date-time';
import { zonelessFormat } from '@shared/format/locale';
import { queryClient } from '@client/lib/query-client';
import { todayIn } from '@client/lib/time';
import { dateParam, dateParamOf } from '../date-param';

export async function loader({ request }: LoaderFunctionArgs) {
  await queryClient.ensureQueryData(dayQueries.desk(dateParamOf(request)));
  return null;
}

export function Component() {
  const [search, setSearch] = useSearchParams();
  const { data: day } = useSuspenseQuery(dayQueries.desk(dateParam(search)));
  // The bands are extra: the day shows without them while they load (or if they fail).
  const windows = useQuery(windowQueries.list(day.date));
  const columns = search.get('view') === 'chairs' ? 'chair' : 'stylist';
  // Only today runs late: other days are as booked.
  const today = day.date === todayIn(day.timeZone);
  const stylistNames = Object.fromEntries(day.stylists.map((s) => [s.id, s.name]));
  return (
    <DayBookView
      day={day}
      title={(isToday) => (isToday ? "Today's book" : `Book for ${formatDate(day.date, zonelessFormat)}`)}
      hrefFor={(date) => (columns === 'chair' ? `${paths.desk(date)}&view=chairs` : paths.desk(date))}
      windows={windows.data?.windows}
      bookingHref={paths.deskBooking}
      lead={
        <>
          {today && (
            <SectionCard title="Running late">
              <RunningLatePanel date={day.date} stylistNames={stylistNames} />
            </SectionCard>
          )}
          <SectionCard title="Arrivals">
            <ArrivalsList day={day} />
          </SectionCard>
        </>
      }
      columns={columns}
      onColumnsChange={(by) =>
        setSearch((now) => {
          const next = new URLSearchParams(now);
          if (by === 'chair') next.set('view', 'chairs');
          else next.delete('view');
          return next;
        })
      }
    >
      <SectionCard title="Clients">
        <ClientSearch />
      </SectionCard>
    </DayBookView>
  );
}
