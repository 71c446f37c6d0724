import type { ReplanSummary } from '@shared/schemas/replan.schemas';
import { formatRange } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

type Props = { replan: ReplanSummary; bookingId: string; timeZone: string };

/**
 * What the stylist's last tap means for the rest of their day: the later clients this sitting now runs into (the
 * front desk has the fixes), or the minutes an early finish freed (listed with the hands-free windows).
 */
export function TapReplanNote({ replan, bookingId, timeZone }: Props) {
  const mine = replan.conflicts.filter((c) => c.cause?.bookingId === bookingId || (c.cause === null && c.sitting.bookingId === bookingId));
  if (mine.length === 0 && replan.freed.length === 0) return null;
  return (
    <div role="status" className="flex flex-col gap-1 rounded-lg border-l-4 border-amber bg-white px-3 py-2 text-sm ring-1 ring-ink/10">
      {mine.map((c) => (
        <p key={`${c.sitting.sittingId}-${c.kind}`}>
          {c.words} <span className="text-ink/80">The front desk has the fixes.</span>
        </p>
      ))}
      {replan.freed.map((f) => (
        <p key={f.start}>
          Freed {f.minutes} min (<span className="tabular">{formatRange(f.start, f.end, formatFor(timeZone))}</span>): see Hands-free windows.
        </p>
      ))}
    </div>
  );
}
