import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { IdSchema } from '@shared/schemas/common.schemas';
import { PageHeader } from '@client/components/ui/page-header';
import { TimeZoneNote } from '@client/components/ui/time-zone-note';
import { paths } from '@client/config/paths';
import { mixLogQueries } from '@client/features/mix-log/api/mix-log-queries';
import { MixLogSection } from '@client/features/mix-log/components/mix-log-section';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { queryClient } from '@client/lib/query-client';

export async function loader({ params }: LoaderFunctionArgs) {
  if (!IdSchema.safeParse(params.id).success) throw new Response(null, { status: 404 });
  await Promise.all([queryClient.ensureQueryData(mixLogQueries.list(params.id!)), queryClient.ensureQueryData(salonQueries.current())]);
  return null;
}

/** The stylist's mix log of one booking, opened from a client card on My day. */
export function Component() {
  const { id } = useParams();
  // The client's id (from My day) files the visit's photos under the client.
  const client = useSearchParams()[0].get('client');
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  return (
    <div className="flex flex-col gap-6">
      <Link to={paths.stylist()} className="text-link">
        ← Back to My day
      </Link>
      <PageHeader title="Mix log" subtitle={<TimeZoneNote timeZone={salon.timeZone} />} />
      <MixLogSection bookingId={id!} timeZone={salon.timeZone} clientId={IdSchema.safeParse(client).success ? client! : undefined} currency={salon.currency} />
    </div>
  );
}
