import { useSuspenseQuery } from '@tanstack/react-query';
import { PageHeader } from '@client/components/ui/page-header';
import { SectionCard } from '@client/components/ui/section-card';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { setupQueries } from '@client/features/setup/api/setup-queries';
import { SetupNav } from '@client/features/setup/components/setup-nav';
import { UnitsPanel } from '@client/features/setup/components/units-panel';
import { queryClient } from '@client/lib/query-client';

export async function loader() {
  await Promise.all([queryClient.ensureQueryData(setupQueries.units()), queryClient.ensureQueryData(salonQueries.current())]);
  return null;
}

export function Component() {
  const { data } = useSuspenseQuery(setupQueries.units());
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  return (
    <div className="flex flex-col gap-6">
      <div>
        <PageHeader title="Set-up" subtitle="Chairs and basins. Out of service means no new booking is planned on it for those days." />
        <SetupNav />
      </div>
      <SectionCard title="Chairs">
        <UnitsPanel kind="chairs" units={data.chairs} timeZone={salon.timeZone} />
      </SectionCard>
      <SectionCard title="Basins">
        <UnitsPanel kind="basins" units={data.basins} timeZone={salon.timeZone} />
      </SectionCard>
    </div>
  );
}
