import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { Link, useLocation, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { paths } from '@client/config/paths';
import { sessionQueries } from '@client/features/auth/api/session-queries';
import { BookingFlowPage } from '@client/features/online-booking/components/booking-flow-page';
import { publicSalonQueries } from '@client/features/public-salon/api/public-salon-queries';
import { queryClient } from '@client/lib/query-client';
import { currentUser } from '../require-role';

/** Public until the client must sign in (mid-flow); then sign-in brings them back here with `next`. */
export async function loader({ params }: LoaderFunctionArgs) {
  await Promise.all([queryClient.ensureQueryData(publicSalonQueries.bySlug(params.slug ?? '')), currentUser()]);
  return null;
}

export function Component() {
  const { slug = '' } = useParams();
  const [params] = useSearchParams();
  const location = useLocation();
  const { data: salon } = useSuspenseQuery(publicSalonQueries.bySlug(slug));
  const { data: user } = useQuery(sessionQueries.current());
  const service = salon.services.find((s) => s.id === params.get('service') && s.onlineBookable);
  if (!service) {
    return (
      <div className="mx-auto max-w-xl">
        <h1 className="text-3xl font-extrabold tracking-tight">Choose a service first</h1>
        <p className="mt-3">That service cannot be booked online. Pick one from the salon&apos;s page.</p>
        <Link to={paths.salon(slug)} className="mt-4 inline-block text-link">
          See {salon.name}&apos;s services
        </Link>
      </div>
    );
  }
  return (
    <BookingFlowPage
      key={service.id}
      salon={salon}
      serviceId={service.id}
      user={user ?? null}
      returnTo={location.pathname + location.search}
      paymentCancelled={params.get('payment') === 'cancelled'}
    />
  );
}
