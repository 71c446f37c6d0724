import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { IdSchema } from '@shared/schemas/common.schemas';
import { buttonClasses } from '@client/components/ui/button';
import { PageHeader } from '@client/components/ui/page-header';
import { Notice } from '@client/components/ui/notice';
import { REACTION_CAUTION } from '@shared/schemas/hair-history.schemas';
import { TimeZoneNote } from '@client/components/ui/time-zone-note';
import { paths } from '@client/config/paths';
import { SectionCard } from '@client/components/ui/section-card';
import { ClientConsultations } from '@client/features/consultations/components/client-consultations';
import { SkinTestsPanel } from '@client/features/test-records/components/skin-tests-panel';
import { StrandTestsPanel } from '@client/features/test-records/components/strand-tests-panel';
import { BookingList } from '@client/features/bookings/components/booking-list';
import { clientQueries } from '@client/features/clients/api/client-queries';
import { ClientProfile } from '@client/features/clients/components/client-profile';
import { GuardianConsentPanel } from '@client/features/clients/components/guardian-consent-panel';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { queryClient } from '@client/lib/query-client';

export async function loader({ params }: LoaderFunctionArgs) {
  // A malformed id can't name a client: show "not found" without asking the server.
  if (!IdSchema.safeParse(params.id).success) throw new Response(null, { status: 404 });
  await Promise.all([queryClient.ensureQueryData(clientQueries.detail(params.id!)), queryClient.ensureQueryData(salonQueries.current())]);
  return null;
}

export function Component() {
  const { id } = useParams();
  const { data: client } = useSuspenseQuery(clientQueries.detail(id!));
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  return (
    <div className="flex flex-col gap-6">
      <Link to={paths.desk()} className="text-link">
        ← Back to the book
      </Link>
      <PageHeader
        title={client.name}
        subtitle={<TimeZoneNote timeZone={salon.timeZone} />}
        action={
          <Link to={paths.deskBook(undefined, { client: client.id })} className={buttonClasses('secondary')}>
            Book for {client.name}
          </Link>
        }
      />
      {client.reportedReaction !== null && (
        <Notice tone="danger" title="This client reported a reaction to hair colour">
          {client.reportedReaction ? `In their hair history: “${client.reportedReaction}”. ` : ''}
          They cannot book colour that needs a skin test online. {REACTION_CAUTION}
        </Notice>
      )}
      <ClientProfile client={client} />
      <SectionCard title="Age and consent">
        <GuardianConsentPanel clientId={client.id} zone={salon.timeZone} />
      </SectionCard>
      <SectionCard title="Skin tests">
        <SkinTestsPanel clientId={client.id} zone={salon.timeZone} />
      </SectionCard>
      <SectionCard title="Strand tests">
        <StrandTestsPanel clientId={client.id} zone={salon.timeZone} />
      </SectionCard>
      <SectionCard title="Consultations and quotes">
        <ClientConsultations clientId={client.id} timeZone={salon.timeZone} currency={salon.currency} />
      </SectionCard>
      <BookingList
        bookings={client.bookings}
        timeZone={salon.timeZone}
        currency={salon.currency}
        actions={(booking) => (
          <Link to={paths.deskBooking(booking.id)} className="text-link mt-3 inline-block" aria-label={`Open ${booking.service.name} for ${client.name}`}>
            Open the booking
          </Link>
        )}
      />
    </div>
  );
}
