import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { useMemo } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { SectionCard } from '@client/components/ui/section-card';
import { paths } from '@client/config/paths';
import { sessionQueries } from '@client/features/auth/api/session-queries';
import { dayQueries } from '@client/features/day-book/api/day-queries';
import { DayBookView } from '@client/features/day-book/components/day-book-view';
import { DayStepsList } from '@client/features/day-book/components/day-steps-list';
import { ownDay } from '@client/features/day-book/own-day';
import { MyClients } from '@client/features/my-day/components/my-clients';
import { windowQueries } from '@client/features/windows/api/window-queries';
import { WindowList } from '@client/features/windows/components/window-list';
import { queryClient } from '@client/lib/query-client';
import { dateParam, dateParamOf } from '../date-param';

export async function loader({ request }: LoaderFunctionArgs) {
  await queryClient.ensureQueryData(dayQueries.stylist(dateParamOf(request)));
  return null;
}

export function Component() {
  const [search] = useSearchParams();
  const { data: user } = useSuspenseQuery(sessionQueries.current());
  const { data } = useSuspenseQuery(dayQueries.stylist(dateParam(search)));
  const day = useMemo(() => ownDay(data, user?.name ?? 'Me'), [data, user]);
  const windows = useQuery(windowQueries.list(day.date));
  return (
    <DayBookView
      day={day}
      title={() => 'My day'}
      hrefFor={paths.stylist}
      windows={windows.data?.windows}
      lead={
        <>
          <SectionCard title="My clients">
            <MyClients day={day} />
          </SectionCard>
          <SectionCard title="Hands-free windows">
            <WindowList date={day.date} />
          </SectionCard>
        </>
      }
    >
      <SectionCard title="My clients' steps">
        <DayStepsList day={day} />
      </SectionCard>
    </DayBookView>
  );
}
