import { useQuery } from '@tanstack/react-query';
import type { HairHistory } from '@shared/schemas/hair-history.schemas';
import { FormAlert } from '@client/components/ui/form-alert';
import { LoadingState } from '@client/components/ui/loading-state';
import { formatDate } from '@shared/format/date-time';
import { deviceFormat } from '@client/lib/time';
import { hairHistoryQueries } from '../api/hair-history-queries';
import { answerLabels, answerQuestions, methodLabels, structuralLabels } from './hair-history-labels';
import { ReactionCaution } from './reaction-caution';

/** The client's answers, read-only, for the salon's team; a reported reaction leads. */
export function HairHistorySummary({ clientId }: { clientId: string }) {
  const history = useQuery(hairHistoryQueries.detail({ clientId }));
  if (history.isPending) return <LoadingState label="Loading hair history…" />;
  if (history.isError) return <FormAlert>{history.error.message}</FormAlert>;
  const { answers, updatedAt } = history.data;
  if (!answers) return <p>The client has not filled in a hair history yet.</p>;
  return (
    <div className="flex flex-col gap-3">
      {answers.previousReaction.answer !== 'no' && <ReactionCaution emphasised />}
      <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-[max-content_1fr]">
        {rows(answers).map(([term, value]) => (
          <div key={term} className="contents">
            <dt className="font-bold">{term}</dt>
            <dd className="whitespace-pre-line">{value || '—'}</dd>
          </div>
        ))}
      </dl>
      {updatedAt && <p className="text-sm text-ink/80">Last updated {formatDate(updatedAt, deviceFormat(), { width: 'short' })}.</p>}
    </div>
  );
}

const withDetails = (a: { answer: keyof typeof answerLabels; details: string }) => [answerLabels[a.answer], a.details].filter(Boolean).join(' — ');

function rows(h: HairHistory): [string, string][] {
  const structural = (Object.keys(structuralLabels) as (keyof typeof structuralLabels)[]).filter((k) => h.structural[k]).map((k) => structuralLabels[k]);
  return [
    ['Previous reaction to colour', withDetails(h.previousReaction)],
    ['Colour now', [h.currentColour, methodLabels[h.currentColourMethod]].filter(Boolean).join(' — ')],
    ['Past colour services', h.pastServices.map((s) => (s.when ? `${s.service} (${s.when})` : s.service)).join('\n')],
    ...answerQuestions.map((q): [string, string] => [q.question, withDetails(h[q.name])]),
    ['Relaxers, perms, keratin', [structural.join(', '), h.structural.details].filter(Boolean).join(' — ')],
    ['Scalp conditions', h.scalpConditions],
    ['Medical notes (private)', h.medicalNotes],
  ];
}
