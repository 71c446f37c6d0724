import type { ClientDetail } from '@shared/schemas/client.schemas';
import { SectionCard } from '@client/components/ui/section-card';
import { ClientContactForm } from './client-contact-form';
import { ClientNotesForm } from './client-notes-form';
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
        {/* Keyed by the saved text: the form starts again from what another screen saved meanwhile. */}
        <ClientNotesForm key={client.notes} clientId={client.id} notes={client.notes} />
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
