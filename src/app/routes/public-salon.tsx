import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { publicSalonQueries } from '@client/features/public-salon/api/public-salon-queries';
import { SalonPage } from '@client/features/public-salon/components/salon-page';
import { queryClient } from '@client/lib/query-client';

/** Public: the salon's menu, hours and policies; no sign-in. An unknown slug answers 404 (the not-found page). */
export async function loader({ params }: LoaderFunctionArgs) {
  await queryClient.ensureQueryData(publicSalonQueries.bySlug(params.slug ?? ''));
  return null;
}

export function Component() {
  const { slug = '' } = useParams();
  const { data: salon } = useSuspenseQuery(publicSalonQueries.bySlug(slug));
  return <SalonPage salon={salon} />;
}
