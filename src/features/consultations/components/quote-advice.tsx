import type { ProposedQuoteView, QuoteWarning } from '@shared/schemas/consultation.schemas';
import { QUOTE_CAUTIONS } from '@shared/quotes/propose-quote';
import { Notice } from '@client/components/ui/notice';
import { formatMoney } from '@shared/money/money';

/** The rules' warnings for this hair, and the cautions every chemical quote carries. */
export function QuoteWarnings({ warnings }: { warnings: QuoteWarning[] }) {
  return (
    <div className="flex flex-col gap-3">
      {warnings.map((w) => (
        <Notice key={w.code} tone={w.code === 'strand_test_failed' ? 'danger' : 'caution'} title={w.message} />
      ))}
      <Notice tone="info" title="Before you book colour work">
        <ul className="list-disc pl-5">
          {QUOTE_CAUTIONS.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </Notice>
    </div>
  );
}

/** How Dwell reached its proposed price, line by line. */
export function ProposalLines({ proposal, currency }: { proposal: ProposedQuoteView; currency: string }) {
  return (
    <div className="rounded-lg bg-linen p-3">
      <p className="font-bold">
        Dwell proposes {proposal.sittings} {proposal.sittings === 1 ? 'sitting' : 'sittings'}
        {proposal.daysApart && `, ${proposal.daysApart.min}–${proposal.daysApart.max} days apart`}, {formatMoney(proposal.priceCents, currency)} (deposit{' '}
        {formatMoney(proposal.depositCents, currency)}):
      </p>
      <ul className="tabular">
        {proposal.lines.map((l) => (
          <li key={l.label}>
            {l.label}: {formatMoney(l.cents, currency)}
          </li>
        ))}
      </ul>
      <p className="text-sm text-ink/80">Rounded up to the whole unit. Change anything below before saving.</p>
    </div>
  );
}
