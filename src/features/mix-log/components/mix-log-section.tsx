import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { MixLog } from '../../../../shared/schemas/mix-log.schemas';
import { LoadingState } from '../../../components/ui/loading-state';
import { SectionCard } from '../../../components/ui/section-card';
import { SelectField } from '../../../components/ui/select-field';
import { formatDay, formatTime } from '../../../lib/time';
import { mixLogQueries } from '../api/mix-log-queries';
import { productTypeLabels } from '../product-type-labels';
import { BowlForm } from './bowl-form';
import { MixLogCaution } from './mix-log-caution';
import { RepeatForm } from './repeat-form';
import { formatMoney } from '../../../lib/booking-labels';
import { PhotoUploader } from '../../photos/components/photo-uploader';

type Props = { bookingId: string; timeZone: string; clientId?: string; currency: string };

function BowlLine({ log }: { log: MixLog }) {
  return (
    <li className="rounded-lg p-3 ring-1 ring-ink/10">
      <p className="font-bold">
        Bowl {log.bowlNo}: {productTypeLabels[log.productType]} {log.shadeNotes && `— ${log.shadeNotes}`}
      </p>
      <p className="tabular text-sm">
        {log.developerPercent !== null && `${log.developerPercent} % (${log.developerVolume} vol) · `}
        {log.ratio && `${log.ratio} · `}
        {log.grams.map((g) => `${g.part} ${g.grams} g`).join(', ')}
        {log.appliedTo && ` · ${log.appliedTo}`}
      </p>
      <p className="tabular text-sm text-ink/80">
        {log.plannedMinutes ?? '—'} min planned, {log.actualMinutes ?? '—'} min actual{log.heat ? ', with heat' : ''}
        {log.resultNotes && ` · ${log.resultNotes}`}
      </p>
    </li>
  );
}

/** The mix log of one booking: bowls and grams used per sitting, repeat last time, and a form for the next bowl. */
export function MixLogSection({ bookingId, timeZone, clientId, currency }: Props) {
  const { data, isPending, isError } = useQuery(mixLogQueries.list(bookingId));
  const [chosen, setChosen] = useState<number | null>(null);
  if (isPending) return <LoadingState />;
  if (isError) return <p>The mix log could not be loaded.</p>;
  const started = data.sittings.filter((s) => s.started).map((s) => s.seq);
  const target = chosen ?? started[started.length - 1];
  const nextBowl = Math.max(0, ...data.logs.filter((l) => l.sittingSeq === target).map((l) => l.bowlNo)) + 1;
  return (
    <SectionCard title="Mix log">
      <div className="flex flex-col gap-5">
        <MixLogCaution maxPercent={data.maxDeveloperPercent} />
        {data.sittings.map((s) => {
          const bowls = data.logs.filter((l) => l.sittingSeq === s.seq);
          return (
            <section key={s.seq} aria-label={`Sitting ${s.seq}`} className="flex flex-col gap-2">
              <h3 className="text-lg font-bold">
                Sitting {s.seq} · <span className="tabular">{formatDay(s.start, timeZone)} {formatTime(s.start, timeZone)}</span>
              </h3>
              {!s.started && <p className="text-ink/80">Not started yet; bowls are written once it has.</p>}
              {s.started && bowls.length === 0 && <p className="text-ink/80">No bowls written.</p>}
              <ul className="flex flex-col gap-2">
                {bowls.map((log) => <BowlLine key={log.id} log={log} />)}
              </ul>
              {s.totals.length > 0 && (
                <p className="tabular text-sm">
                  <span className="font-bold">Product used:</span> {s.totals.map((t) => `${productTypeLabels[t.productType]} ${t.grams} g`).join(', ')} — {s.totalGrams} g in all ·{' '}
                  <span className="font-bold">Estimated product cost:</span>{' '}
                  {s.estimatedCostCents === null ? 'not known (the owner has not set a cost per gram for every type used)' : formatMoney(s.estimatedCostCents, currency)}
                </p>
              )}
            </section>
          );
        })}
        {clientId && <PhotoUploader kind="hair_now" owner={{ clientId }} bookingId={bookingId} label="Photos of this visit (bowls, result)" />}
        <RepeatForm
          bookingId={bookingId} clientId={clientId} timeZone={timeZone} startedSittings={started}
          loggedSittings={[...new Set(data.logs.map((l) => l.sittingSeq))]}
        />
        {target !== undefined && (
          <div className="flex flex-col gap-3">
            {started.length > 1 && (
              <SelectField label="Write a bowl for" value={String(target)} onChange={(e) => setChosen(Number(e.target.value))} options={started.map((s) => ({ value: String(s), label: `Sitting ${s}` }))} />
            )}
            <BowlForm key={`${target}-${nextBowl}`} bookingId={bookingId} sittingSeq={target} bowlNo={nextBowl} maxPercent={data.maxDeveloperPercent} />
          </div>
        )}
      </div>
    </SectionCard>
  );
}
