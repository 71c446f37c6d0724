import { formatDuration } from '@shared/format/date-time';
import { useQuery } from '@tanstack/react-query';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { sittingMaxMinutes } from '@shared/schemas/step-plan.schemas';
import { myQuoteQueries, useAcceptQuote } from '../api/consultation-queries';
import { formatMoney } from '@shared/money/money';

/** The quotes the salon sent the signed-in client, each with its sittings, price and deposit; accept online. */
export function MyQuotes({ currency }: { currency: string }) {
  const list = useQuery(myQuoteQueries.list());
  const accept = useAcceptQuote();
  if (!list.data || list.data.consultations.length === 0) return null;
  return (
    <section aria-labelledby="my-quotes" className="mb-8 flex flex-col gap-3">
      <h2 id="my-quotes" className="text-2xl font-bold">
        Your quotes
      </h2>
      {accept.isError && <FormAlert>{accept.error.message}</FormAlert>}
      {list.data.consultations.map(({ quote: q }) => (
        <article key={q.id} aria-label={`Quote for ${q.serviceName}`} className="flex flex-col gap-2 rounded-2xl bg-white p-4 shadow-sm ring-1 ring-ink/15">
          <h3 className="text-lg font-bold">{q.serviceName}</h3>
          <ol className="list-decimal pl-5">
            {q.stepPlan.sittings.map((s, i) => (
              <li key={i}>
                Up to {formatDuration(sittingMaxMinutes(q.stepPlan)[i]!)}
                {s.daysAfterPrevious && `, ${s.daysAfterPrevious.min}–${s.daysAfterPrevious.max} days after the previous sitting`}:{' '}
                {s.steps.map((st) => st.label).join(', ')}
              </li>
            ))}
          </ol>
          <p className="tabular">
            {formatMoney(q.priceCents, currency)}, deposit {formatMoney(q.depositCents, currency)}
          </p>
          {q.notes && <p className="whitespace-pre-line">{q.notes}</p>}
          <p className="text-sm text-ink/80">
            Colour work needs a skin test read before the appointment; your colourist decides on the day what is safe for your hair.
          </p>
          {q.status === 'accepted' ? (
            <p className="font-bold">You accepted this quote. The salon will book the sittings with you.</p>
          ) : (
            <div>
              <Button busy={accept.isPending && accept.variables === q.id} onClick={() => accept.mutate(q.id)}>
                Accept this quote
              </Button>
            </div>
          )}
        </article>
      ))}
    </section>
  );
}
