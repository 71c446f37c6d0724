import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { IdSchema } from '@shared/schemas/common.schemas';
import { buttonClasses } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { PageHeader } from '@client/components/ui/page-header';
import { SectionCard } from '@client/components/ui/section-card';
import { paths } from '@client/config/paths';
import { sessionQueries } from '@client/features/auth/api/session-queries';
import { catalogueQueries } from '@client/features/catalogue/api/catalogue-queries';
import { consultationQueries, useEditQuote } from '@client/features/consultations/api/consultation-queries';
import { quoteStatusLabels } from '@client/features/consultations/components/consultation-labels';
import { ConsultationSummary } from '@client/features/consultations/components/consultation-summary';
import { SendQuote } from '@client/features/consultations/components/send-quote';
import { QuoteWarnings } from '@client/features/consultations/components/quote-advice';
import { QuoteEditor } from '@client/features/consultations/components/quote-editor';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { queryClient } from '@client/lib/query-client';
import { formatDate } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { formatMoney } from '@shared/money/money';

export async function loader({ params }: LoaderFunctionArgs) {
  if (!IdSchema.safeParse(params.id).success) throw new Response(null, { status: 404 });
  await Promise.all([
    queryClient.ensureQueryData(consultationQueries.detail(params.id!)),
    queryClient.ensureQueryData(catalogueQueries.services()),
    queryClient.ensureQueryData(salonQueries.current()),
  ]);
  return null;
}

/** One consultation and its quote: read the consultation, edit the quote, and (desk) book it. */
export function Component() {
  const { id } = useParams();
  const navigate = useNavigate();
  const { data: view } = useSuspenseQuery(consultationQueries.detail(id!));
  const { data: services } = useSuspenseQuery(catalogueQueries.services());
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  const { data: user } = useSuspenseQuery(sessionQueries.current());
  const edit = useEditQuote(id!);
  const desk = user?.role === 'front_desk' || user?.role === 'owner';
  const q = view.quote;
  return (
    <div className="flex flex-col gap-6">
      <button type="button" className="text-link self-start" onClick={() => navigate(-1)}>
        ← Back
      </button>
      <PageHeader
        title={`Quote for ${view.clientName}`}
        subtitle={`Consultation of ${formatDate(view.createdAt, formatFor(salon.timeZone), { width: 'short' })}${view.createdByName ? ` by ${view.createdByName}` : ''} · ${quoteStatusLabels[q.status]} · ${formatMoney(q.priceCents, salon.currency)}, deposit ${formatMoney(q.depositCents, salon.currency)}`}
        action={
          desk && (
            <Link to={paths.deskBook(view.id)} className={buttonClasses('primary')}>
              Book this quote
            </Link>
          )
        }
      />
      {q.bookingIds.length > 0 && (
        <p>
          Booked:{' '}
          {q.bookingIds.map((b, i) =>
            desk ? (
              <Link key={b} to={paths.deskBooking(b)} className="text-link">
                booking {i + 1}
              </Link>
            ) : (
              <span key={b}>booking {i + 1}</span>
            ),
          )}
        </p>
      )}
      <SectionCard title="Send to the client">
        <SendQuote view={view} timeZone={salon.timeZone} />
      </SectionCard>
      <SectionCard title="Consultation">
        <ConsultationSummary view={view} />
      </SectionCard>
      <SectionCard title="Quote">
        <div className="flex flex-col gap-4">
          <QuoteWarnings warnings={q.warnings} />
          {edit.isSuccess && <FormAlert tone="success">Quote saved{q.status === 'draft' ? ' (draft)' : ''}.</FormAlert>}
          <QuoteEditor
            key={`${q.id}-${edit.submittedAt}`}
            services={services.services}
            strandTest={view.strandTest}
            currency={salon.currency}
            submitLabel="Save quote"
            initial={{
              serviceId: q.serviceId,
              stepPlan: q.stepPlan,
              priceCents: q.priceCents,
              depositCents: q.depositCents,
              notes: q.notes,
              overrideReason: q.overrideReason,
            }}
            onSave={(quote) => edit.mutateAsync(quote)}
          />
        </div>
      </SectionCard>
    </div>
  );
}
