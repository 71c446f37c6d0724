import { useSuspenseQuery } from '@tanstack/react-query';
import { BookServicePage } from '../../features/booking-flow/components/book-service-page';
import { catalogueQueries } from '../../features/catalogue/api/catalogue-queries';
import { salonQueries } from '../../features/salon/api/salon-queries';
import { queryClient } from '../../lib/query-client';
import { todayIn } from '../../lib/time';

export async function loader() {
  await Promise.all([
    queryClient.ensureQueryData(catalogueQueries.services()),
    queryClient.ensureQueryData(catalogueQueries.stylists()),
    queryClient.ensureQueryData(salonQueries.current()),
  ]);
  return null;
}

export function Component() {
  const { data: services } = useSuspenseQuery(catalogueQueries.services());
  const { data: stylists } = useSuspenseQuery(catalogueQueries.stylists());
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  return <BookServicePage services={services.services} stylists={stylists.stylists} today={todayIn(salon.timeZone)} />;
}
