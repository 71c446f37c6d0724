import { useSuspenseQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { buttonClasses } from '@client/components/ui/button';
import { PageHeader } from '@client/components/ui/page-header';
import { paths } from '@client/config/paths';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { setupQueries } from '@client/features/setup/api/setup-queries';
import { ServicesTable } from '@client/features/setup/components/services-table';
import { SetupNav } from '@client/features/setup/components/setup-nav';
import { queryClient } from '@client/lib/query-client';

export async function loader() {
  await Promise.all([queryClient.ensureQueryData(setupQueries.services()), queryClient.ensureQueryData(salonQueries.current())]);
  return null;
}

export function Component() {
  const { data } = useSuspenseQuery(setupQueries.services());
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  return (
    <div>
      <PageHeader
        title="Set-up"
        subtitle="Services and their step plans. Changing a service never changes bookings already made."
        action={
          <Link to={paths.ownerSetupService('new')} className={buttonClasses('primary')}>
            Add a service
          </Link>
        }
      />
      <SetupNav />
      <ServicesTable services={data.services} currency={salon.currency} families={salon.skinTestFamilies} />
    </div>
  );
}
