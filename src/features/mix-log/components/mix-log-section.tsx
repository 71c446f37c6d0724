import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { strengthWords } from '@shared/calculators/developer';
import { mixLogWritable, type MixLog } from '@shared/schemas/mix-log.schemas';
import { LoadingState } from '@client/components/ui/loading-state';
import { Notice } from '@client/components/ui/notice';
import { SectionCard } from '@client/components/ui/section-card';
import { SelectField } from '@client/components/ui/select-field';
import { formatDate, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { mixLogQueries } from '../api/mix-log-queries';
import { partKindLabels, productTypeLabels } from '../product-type-labels';
import { BowlForm } from './bowl-form';
import { MixLogCaution } from './mix-log-caution';
import { ProductUseSummary } from './product-use-summary';
import { RepeatForm } from './repeat-form';
import { PhotoUploader } from '@client/features/photos';

type Props = { bookingId: string; timeZone: string; clientId?: string; currency: string };

function BowlLine({ log }: { log: MixLog }) {
  return (
    <li className="rounded-lg p-3 ring-1 ring-ink/10">
      <p className="font-bold">
        Bowl {log.bowlNo}: {productTypeLabels[log.productType]} {log.shadeNotes && `— ${log.shadeNotes}`}
      </p>
      <p className="tabular text-sm">
        {log.developerPercent !== null && `${strengthWords(log.developerPercent)} · `}
        {log.ratio && `${log.ratio} · `}
        {log.grams.map((g) => `${partKindLabels[g.kind]}${g.part && ` (${g.part})`} ${g.grams} g`).join(', ')}
        {log.appliedTo && ` · ${log.appliedTo}`}
      </p>
      <p className="tabular text-sm text-ink/80">
        {log.plannedMinutes ?? '—'} min planned, {log.actualMinutes ?? '—'} min actual{log.heat ? ', with heat' : ''}
        {log.resultNotes && ` · ${log.resultNotes}`}
      </p>
    </li>
  );
}

/** The mix log of one booking: bowls and product used per sitting, repeat last time, and a form for the next bowl. */
export function MixLogSection({ bookingId, timeZone, clientId, currency }: Props) {
  const { data, isPending, isError } = useQuery(mixLogQueries.list(bookingId));
  const [chosen, setChosen] = useState<number | null>(null);
  if (isPending) return <LoadingState />;
  if (isError) return <p>The mix log could not be loaded.</p>;
  const writable = mixLogWritable(data.bookingStatus);
  // Any sitting of a booking that is not cancelled, before it starts too: the formula is usually ready before
  // the client reaches the basin. Offered first: the latest sitting under way, else the first one to come.
  const targets = writable ? data.sittings.map((s) => s.seq) : [];
  const started = data.sittings.filter((s) => s.started).map((s) => s.seq);
  const target = writable ? (chosen ?? started[started.length - 1] ?? targets[0]) : undefined;
  const nextBowl = Math.max(0, ...data.logs.filter((l) => l.sittingSeq === target).map((l) => l.bowlNo)) + 1;
  return (
    <SectionCard title="Mix log">
      <div className="flex flex-col gap-5">
        <MixLogCaution maxPercent={data.maxDeveloperPercent} />
        {!writable && (
          <Notice tone="info" title="This booking is cancelled">
            Its mix log is kept for the record; no bowls can be added.
          </Notice>
        )}
        {data.sittings.map((s) => {
          const bowls = data.logs.filter((l) => l.sittingSeq === s.seq);
          return (
            <section key={s.seq} aria-label={`Sitting ${s.seq}`} className="flex flex-col gap-2">
              <h3 className="text-lg font-bold">
                Sitting {s.seq} ·{' '}
                <span className="tabular">
                  {formatDate(s.start, formatFor(timeZone), { width: 'short' })} {formatTime(s.start, formatFor(timeZone))}
                </span>
              </h3>
              {bowls.length === 0 && (
                <p className="text-ink/80">{!s.started && writable ? 'Not started yet; bowls can be written ahead.' : 'No bowls written.'}</p>
              )}
              <ul className="flex flex-col gap-2">
                {bowls.map((log) => (
                  <BowlLine key={log.id} log={log} />
                ))}
              </ul>
              {s.totals.length > 0 && (
                <ProductUseSummary totals={s.totals} totalGrams={s.totalGrams} estimatedCostCents={s.estimatedCostCents} currency={currency} />
              )}
            </section>
          );
        })}
        {clientId && <PhotoUploader kind="hair_now" owner={{ clientId }} bookingId={bookingId} label="Photos of this visit (bowls, result)" />}
        {target !== undefined && <RepeatForm bookingId={bookingId} sources={data.repeatSources} targets={targets} target={target} timeZone={timeZone} />}
        {target !== undefined && (
          <div className="flex flex-col gap-3">
            {targets.length > 1 && (
              <SelectField
                label="Write a bowl for"
                value={String(target)}
                onChange={(e) => setChosen(Number(e.target.value))}
                options={targets.map((s) => ({ value: String(s), label: `Sitting ${s}` }))}
              />
            )}
            <BowlForm key={`${target}-${nextBowl}`} bookingId={bookingId} sittingSeq={target} bowlNo={nextBowl} maxPercent={data.maxDeveloperPercent} />
          </div>
        )}
      </div>
    </SectionCard>
  );
}
