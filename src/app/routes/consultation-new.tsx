import { zodResolver } from '@hookform/resolvers/zod';
import { useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import type { ProposedQuoteView } from '@shared/schemas/consultation.schemas';
import { IdSchema } from '@shared/schemas/common.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { PageHeader } from '@client/components/ui/page-header';
import { SectionCard } from '@client/components/ui/section-card';
import { paths } from '@client/config/paths';
import { catalogueQueries } from '@client/features/catalogue/api/catalogue-queries';
import { clientQueries } from '@client/features/clients/api/client-queries';
import { consultationQueries, useCreateConsultation, useProposeQuote } from '@client/features/consultations/api/consultation-queries';
import { ConsultationFields } from '@client/features/consultations/components/consultation-fields';
import { PhotoPicker } from '@client/features/consultations/components/photo-picker';
import { ProposalLines, QuoteWarnings } from '@client/features/consultations/components/quote-advice';
import { QuoteEditor } from '@client/features/consultations/components/quote-editor';
import { ConsultationFormSchema, type ConsultationFormInput, type ConsultationFormValues } from '@client/features/consultations/consultation-form-schema';
import { consultationStart } from '@client/features/consultations/consultation-start';
import { hairHistoryQueries } from '@client/features/hair-history/api/hair-history-queries';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { queryClient } from '@client/lib/query-client';

export async function loader({ request }: LoaderFunctionArgs) {
  const clientId = new URL(request.url).searchParams.get('client');
  if (!IdSchema.safeParse(clientId).success) throw new Response(null, { status: 404 });
  await Promise.all([
    queryClient.ensureQueryData(clientQueries.detail(clientId!)),
    queryClient.ensureQueryData(catalogueQueries.services()),
    queryClient.ensureQueryData(salonQueries.current()),
    queryClient.ensureQueryData(consultationQueries.ofClient(clientId!)),
    queryClient.ensureQueryData(hairHistoryQueries.detail({ clientId: clientId! })),
  ]);
  return null;
}

const startedFrom = {
  earlier: 'Started from this client’s last consultation: change what is different today.',
  hair_history: 'Colour history from the client’s own hair history; look, and type the levels you find.',
  nothing: 'No earlier consultation or hair history: type what you find.',
};

/** Record a consultation, see the quote Dwell proposes, edit it, save both. */
export function Component() {
  const [params] = useSearchParams();
  const clientId = params.get('client')!;
  const navigate = useNavigate();
  const { data: client } = useSuspenseQuery(clientQueries.detail(clientId));
  const { data: services } = useSuspenseQuery(catalogueQueries.services());
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  const { data: earlier } = useSuspenseQuery(consultationQueries.ofClient(clientId));
  const { data: hair } = useSuspenseQuery(hairHistoryQueries.detail({ clientId }));
  // The newest consultation comes first.
  const [start] = useState(() => consultationStart(earlier.consultations[0]?.consultation, hair.answers));
  const form = useForm<ConsultationFormInput, unknown, ConsultationFormValues>({
    resolver: zodResolver(ConsultationFormSchema),
    defaultValues: start.values,
  });
  const propose = useProposeQuote();
  const create = useCreateConsultation();
  // The consultation the shown proposal was made for: that is what gets saved with the quote.
  const [proposed, setProposed] = useState<{ values: ConsultationFormValues; quote: ProposedQuoteView; at: number } | null>(null);
  const ask = form.handleSubmit((values) =>
    propose.mutateAsync({ consultation: values.consultation, serviceId: null, clientId }).then((quote) => setProposed({ values, quote, at: Date.now() })),
  );
  const colourServices = services.services.filter((s) => s.category === 'colour');

  return (
    <div className="flex flex-col gap-6">
      <button type="button" className="text-link self-start" onClick={() => navigate(-1)}>
        ← Back
      </button>
      <PageHeader title={`Consultation for ${client.name}`} subtitle="Record the hair as you find it; Dwell proposes a quote you can change." />
      <SectionCard title="The hair now">
        <form onSubmit={(e) => void ask(e)} noValidate className="flex flex-col gap-6" aria-label="Consultation">
          <p className="text-ink/80">{startedFrom[start.from]}</p>
          <ConsultationFields form={form} />
          <PhotoPicker clientId={clientId} control={form.control} />
          {propose.isError && <FormAlert>{propose.error.message}</FormAlert>}
          <div>
            <Button type="submit" variant={proposed ? 'secondary' : 'primary'} busy={propose.isPending}>
              {proposed ? 'Propose again' : 'Propose a quote'}
            </Button>
          </div>
        </form>
      </SectionCard>
      {proposed && (
        <SectionCard title="Proposed quote">
          <div className="flex flex-col gap-4">
            <ProposalLines proposal={proposed.quote} currency={salon.currency} />
            <QuoteWarnings warnings={proposed.quote.warnings} />
            {create.isError && <FormAlert>{create.error.message}</FormAlert>}
            <QuoteEditor
              key={proposed.at}
              services={colourServices}
              strandTest={proposed.quote.strandTest}
              currency={salon.currency}
              submitLabel="Save consultation and quote"
              initial={{
                serviceId: proposed.quote.serviceId ?? colourServices[0]?.id ?? '',
                stepPlan: proposed.quote.stepPlan,
                priceCents: proposed.quote.priceCents,
                depositCents: proposed.quote.depositCents,
                notes: '',
                overrideReason: '',
              }}
              onSave={(quote) =>
                create
                  .mutateAsync({ clientId, consultation: proposed.values.consultation, photoIds: proposed.values.photoIds, quote })
                  .then((saved) => navigate(paths.consultation(saved.id)))
              }
            />
          </div>
        </SectionCard>
      )}
    </div>
  );
}
