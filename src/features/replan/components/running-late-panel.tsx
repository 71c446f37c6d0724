import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { ApplicableFix, ConflictView, FixView } from '@shared/schemas/replan.schemas';
import { formatRange } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { FormAlert } from '@client/components/ui/form-alert';
import { LoadingState } from '@client/components/ui/loading-state';
import { useConflictAlerts } from '../alerts/use-conflict-alerts';
import { useApplyFix, useTellRunningLate } from '../api/replan-mutations';
import { replanQueries } from '../api/replan-queries';
import { ConflictCard } from './conflict-card';

type Props = { date: string; stylistNames: Record<string, string> };

/**
 * The desk's "Running late": every conflict today's overruns make for later bookings, with fixes best first, and the
 * minutes freed (an early finish, a sitting that moved). It updates itself when a stylist taps (live events) and each minute as steps run on.
 */
export function RunningLatePanel({ date, stylistNames }: Props) {
  const day = useQuery(replanQueries.day(date));
  const apply = useApplyFix();
  const tell = useTellRunningLate();
  const [notice, setNotice] = useState<string | null>(null);
  useConflictAlerts(day.data?.conflicts ?? []);
  if (day.isPending) return <LoadingState label="Re-planning the day…" />;
  if (day.isError) return <p role="alert">The day could not be re-planned: {day.error.message}</p>;
  const { conflicts, freed, timeZone } = day.data;
  const busy = apply.isPending || tell.isPending;
  const error = apply.error ?? tell.error;
  const onApply = (f: FixView) => {
    setNotice(null);
    apply.mutate({ bookingId: f.bookingId, fix: f.fix as ApplicableFix }, { onSuccess: (r) => setNotice(r.done) });
  };
  const onTell = (c: ConflictView, minutesLate: number) => {
    setNotice(null);
    tell.mutate({ bookingId: c.sitting.bookingId, seq: c.sitting.seq, minutesLate }, { onSuccess: (r) => setNotice(r.words) });
  };
  return (
    <div className="flex flex-col gap-4">
      {notice && <FormAlert tone="success">{notice}</FormAlert>}
      {error && <FormAlert>{error.message}</FormAlert>}
      {conflicts.length === 0 ? (
        <p>Nothing is running late.</p>
      ) : (
        <ol className="grid gap-4 lg:grid-cols-2">
          {conflicts.map((c) => (
            <li key={`${c.sitting.sittingId}-${c.cause?.sittingId ?? ''}-${c.kind}`}>
              <ConflictCard conflict={c} date={date} timeZone={timeZone} busy={busy} onApply={onApply} onTell={onTell} />
            </li>
          ))}
        </ol>
      )}
      {freed.length > 0 && (
        <ul className="flex flex-col gap-1 text-sm">
          {freed.map((f) => (
            <li key={`${f.stylistId}-${f.start}`}>
              <span className="font-bold">Hands freed:</span> {stylistNames[f.stylistId] ?? 'A stylist'} is free{' '}
              <span className="tabular">{formatRange(f.start, f.end, formatFor(timeZone))}</span> ({f.minutes} min), shown as a hands-free window.
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
