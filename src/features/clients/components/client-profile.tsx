import type { ClientDetail } from '../../../../shared/schemas/client.schemas';
import { SectionCard } from '../../../components/ui/section-card';
import { HairHistorySummary } from '../../hair-history/components/hair-history-summary';
import { PhotoGallery } from '../../photos/components/photo-gallery';

type Props = { client: ClientDetail };

/** How to reach the client, the salon's notes, their hair history and their photos. */
export function ClientProfile({ client }: Props) {
  return (
    <>
      <SectionCard title="Contact and notes">
        <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-[max-content_1fr]">
          <dt className="font-bold">E-mail</dt>
          <dd>{client.email ? <a className="text-link" href={`mailto:${client.email}`}>{client.email}</a> : '—'}</dd>
          <dt className="font-bold">Phone</dt>
          <dd>{client.phone ? <a className="text-link" href={`tel:${client.phone}`}>{client.phone}</a> : '—'}</dd>
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
