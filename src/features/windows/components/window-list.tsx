import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { FormAlert } from '@client/components/ui/form-alert';
import { LoadingState } from '@client/components/ui/loading-state';
import { windowQueries } from '../api/window-queries';
import { SentOffers } from './sent-offers';
import { WindowCard } from './window-card';

type Props = { date: string; stylistNames?: Record<string, string> };

/** The day's hands-free windows, each ready to fill or offer. */
export function WindowList({ date, stylistNames }: Props) {
  const windows = useQuery(windowQueries.list(date));
  // Kept here: a filled window leaves the list, and its message must stay.
  const [notice, setNotice] = useState<string | null>(null);
  if (windows.isPending) return <LoadingState label="Looking for hands-free windows…" />;
  if (windows.isError) return <p role="alert">The hands-free windows could not be loaded: {windows.error.message}</p>;
  const { windows: list, closedOffers, timeZone } = windows.data;
  return (
    <div className="flex flex-col gap-4">
      {notice && <FormAlert tone="success">{notice}</FormAlert>}
      {list.length === 0 && <p>No hands-free windows on this day.</p>}
      <ul className="grid gap-4 lg:grid-cols-2">
        {list.map((win) => (
          <li key={`${win.stylistId}-${win.start}`}>
            <WindowCard window={win} timeZone={timeZone} stylistName={stylistNames?.[win.stylistId]} onDone={setNotice} />
          </li>
        ))}
      </ul>
      {closedOffers.length > 0 && (
        <section aria-labelledby="closed-offers-heading" className="flex flex-col gap-2">
          <h3 id="closed-offers-heading" className="font-bold">
            Offers for windows that have closed
          </h3>
          <SentOffers offers={closedOffers} timeZone={timeZone} label="Offers for windows that have closed" />
        </section>
      )}
    </div>
  );
}
