import { useSuspenseQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { PageHeader } from '@client/components/ui/page-header';
import { paths } from '@client/config/paths';
import { HandsOnShareTable } from '@client/features/owner/components/hands-on-share-table';
import { SalonCounts } from '@client/features/owner/components/salon-counts';
import { WeekUsage } from '@client/features/owner/components/week-usage';
import { ownerQueries } from '@client/features/owner/api/owner-queries';
import { queryClient } from '@client/lib/query-client';

export async function loader() {
  await queryClient.ensureQueryData(ownerQueries.overview());
  return null;
}

export function Component() {
  const { data: overview } = useSuspenseQuery(ownerQueries.overview());
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Salon overview"
        subtitle={
          <p>
            {overview.salon.name} · {overview.salon.address}
          </p>
        }
      />
      <WeekUsage week={overview.week} />
      <div className="grid gap-6 lg:grid-cols-2">
        <HandsOnShareTable rows={overview.week.handsOnShare} />
        <SalonCounts counts={overview.counts} />
      </div>
      <nav aria-label="Owner shortcuts" className="flex flex-wrap gap-6">
        <Link to={paths.desk()} className="text-link">
          Today's book
        </Link>
        <Link to={paths.outbox} className="text-link">
          Outbox (demo)
        </Link>
      </nav>
    </div>
  );
}
