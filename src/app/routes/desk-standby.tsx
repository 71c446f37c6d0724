import { useSuspenseQuery } from '@tanstack/react-query';
import { PageHeader } from '@client/components/ui/page-header';
import { SectionCard } from '@client/components/ui/section-card';
import { catalogueQueries } from '@client/features/catalogue/api/catalogue-queries';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { standbyQueries } from '@client/features/standby/api/standby-queries';
import { StandbyForm } from '@client/features/standby/components/standby-form';
import { StandbyTable } from '@client/features/standby/components/standby-table';
import { queryClient } from '@client/lib/query-client';

export async function loader() {
  await Promise.all([
    queryClient.ensureQueryData(standbyQueries.list()),
    queryClient.ensureQueryData(catalogueQueries.services()),
    queryClient.ensureQueryData(catalogueQueries.stylists()),
    queryClient.ensureQueryData(salonQueries.current()),
  ]);
  return null;
}

export function Component() {
  const { data: standby } = useSuspenseQuery(standbyQueries.list());
  const { data: services } = useSuspenseQuery(catalogueQueries.services());
  const { data: stylists } = useSuspenseQuery(catalogueQueries.stylists());
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Standby list" subtitle="Clients to call when an earlier time or a window fit opens up." />
      <StandbyTable entries={standby.entries} timeZone={salon.timeZone} />
      <SectionCard title="New standby entry">
        <StandbyForm services={services.services} stylists={stylists.stylists} />
      </SectionCard>
    </div>
  );
}
