import type { ClientDetail } from '@shared/schemas/client.schemas';
import { SectionCard } from '@client/components/ui/section-card';
import { ClientContactForm } from './client-contact-form';
import { HairHistorySummary } from '@client/features/hair-history';
import { PhotoGallery } from '@client/features/photos';

type Props = { client: ClientDetail };

/** How to reach the client, the salon's notes, their hair history and their photos. */
export function ClientProfile({ client }: Props) {
  return (
    <>
      <SectionCard title="Contact and messages">
        <ClientContactForm client={client} />
      </SectionCard>
      <SectionCard title="Notes">
        <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-[max-content_1fr]">
          <dt className="font-bold">Notes</dt>
          <dd className="whitespace-pre-line">{client.notes || 'No notes yet.'}</dd>
        </dl>
      </SectionCard>
      <SectionCard title="Hair history">
        <HairHistorySummary clientId={client.id} />
      </SectionCard>
      <SectionCard title="Photos">
        <PhotoGallery clientId={client.id} />
      </SectionCard>
    </>
  );
}
