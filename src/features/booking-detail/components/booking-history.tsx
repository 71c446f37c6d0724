import { useQuery } from '@tanstack/react-query';
import { LoadingState } from '../../../components/ui/loading-state';
import { SectionCard } from '../../../components/ui/section-card';
import { formatDay, formatTime } from '../../../lib/time';
import { bookingQueries } from '../../bookings/api/booking-queries';
import { actionLabel, describeChange, fieldLabel, valueText } from '../history-change';

type Props = { bookingId: string; timeZone: string };

/** Every change to the booking: who, when, what, and each changed value before → after. */
export function BookingHistory({ bookingId, timeZone }: Props) {
  const history = useQuery(bookingQueries.history(bookingId));
  const when = (iso: string) => `${formatDay(iso, timeZone)}, ${formatTime(iso, timeZone)}`;
  return (
    <SectionCard title="History">
      {history.isPending && <LoadingState label="Loading the history…" />}
      {history.isError && <p role="alert">The history could not be loaded: {history.error.message}</p>}
      {history.data && history.data.entries.length === 0 && <p>No changes recorded yet.</p>}
      {history.data && history.data.entries.length > 0 && (
        <ol className="flex flex-col gap-3">
          {[...history.data.entries].reverse().map((entry, i) => {
            const changes = describeChange(entry.before, entry.after);
            return (
              <li key={`${entry.at}-${i}`} className="rounded-lg bg-linen px-4 py-3">
                <p>
                  <span className="font-bold">{actionLabel(entry.action)}</span> by {entry.actor ?? 'Dwell'}
                  <span className="block text-sm text-ink/80 tabular">{when(entry.at)}</span>
                </p>
                {changes.length > 0 && (
                  <dl className="mt-2 grid gap-x-4 gap-y-1 text-sm sm:grid-cols-[max-content_1fr]">
                    {changes.map((c) => (
                      <div key={c.field} className="contents">
                        <dt className="font-bold">{fieldLabel(c.field)}</dt>
                        <dd className="tabular">
                          {valueText(c.before, when)} <span aria-hidden="true">→</span>
                          <span className="sr-only">changed to</span> {valueText(c.after, when)}
                        </dd>
                      </div>
                    ))}
                  </dl>
                )}
              </li>
            );
          })}
        </ol>
      )}
    </SectionCard>
  );
}
