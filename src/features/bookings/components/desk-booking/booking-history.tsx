import { useQuery } from '@tanstack/react-query';
import { LoadingState } from '@client/components/ui/loading-state';
import { SectionCard } from '@client/components/ui/section-card';
import { formatDate, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { bookingQueries } from '@client/features/bookings/api/booking-queries';
import { describeBookingChange, entryTitle } from '@client/features/bookings/history-change';

type Props = { bookingId: string; timeZone: string; currency: string; stylists: { id: string; name: string }[] };

/** Every change to the booking: who, when, what, and each changed value before → after, in the app's words. */
export function BookingHistory({ bookingId, timeZone, currency, stylists }: Props) {
  const history = useQuery(bookingQueries.history(bookingId));
  const when = (iso: string) => `${formatDate(iso, formatFor(timeZone), { width: 'short' })}, ${formatTime(iso, formatFor(timeZone))}`;
  const words = { timeZone, currency, stylistName: (id: string) => stylists.find((s) => s.id === id)?.name };
  return (
    <SectionCard title="History">
      {history.isPending && <LoadingState label="Loading the history…" />}
      {history.isError && <p role="alert">The history could not be loaded: {history.error.message}</p>}
      {history.data && history.data.entries.length === 0 && <p>No changes recorded yet.</p>}
      {history.data && history.data.entries.length > 0 && (
        <ol className="flex flex-col gap-3">
          {[...history.data.entries].reverse().map((entry, i) => {
            const lines = describeBookingChange(entry.before, entry.after, words);
            return (
              <li key={`${entry.at}-${i}`} className="rounded-lg bg-linen px-4 py-3">
                <p>
                  <span className="font-bold">{entryTitle(entry.action, entry.after)}</span>
                  {entry.actor && ` by ${entry.actor}`}
                  <span className="block text-sm text-ink/80 tabular">{when(entry.at)}</span>
                </p>
                {lines.length > 0 && (
                  <dl className="mt-2 grid gap-x-4 gap-y-1 text-sm sm:grid-cols-[max-content_1fr]">
                    {lines.map((line) => (
                      <div key={line.label} className="contents">
                        <dt className="font-bold">{line.label}</dt>
                        <dd className="tabular">
                          {line.before !== null && line.after !== null ? (
                            <>
                              {line.before} <span aria-hidden="true">→</span>
                              <span className="sr-only">changed to</span> {line.after}
                            </>
                          ) : (
                            (line.after ?? (
                              <>
                                {line.before} <span className="text-ink/80">(removed)</span>
                              </>
                            ))
                          )}
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
