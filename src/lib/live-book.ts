import { useEffect, useState } from 'react';
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { eventsApi } from '@shared/api/events.api';
import { urlOf } from '@shared/api/endpoint';
import { BOOK_CHANGED_EVENT, BookChangedEventSchema, type BookChangedEvent } from '@shared/schemas/live-events.schemas';
import { bookChangedElsewhere } from './cache-rules';

/** Events this close together (a burst of changes) are read as one refresh. */
const BATCH_MS = 200;
/** A connection back within this long (a server's restart, a blip) is not worth a banner. */
const PAUSED_AFTER_MS = 1_500;
/** A refused stream (signed out, a full server) is tried again after 1, 2, 4… seconds, never more than this. */
const MAX_RETRY_MS = 30_000;

const EVERYTHING: BookChangedEvent = { dates: [], everyDate: true, bookingIds: [] };

function merged(a: BookChangedEvent | null, b: BookChangedEvent): BookChangedEvent {
  if (!a) return b;
  const everyDate = a.everyDate || b.everyDate;
  return {
    dates: everyDate ? [] : [...new Set([...a.dates, ...b.dates])],
    everyDate,
    bookingIds: [...new Set([...a.bookingIds, ...b.bookingIds])],
  };
}

/**
 * Listens to the salon's live stream (GET /api/events) and refreshes what a change of the book makes stale, through
 * the one cache rule for it. After a lost connection it says so (`onPaused`) and, once back, reads the same set
 * again, since changes made meanwhile were not heard; so does the first opening, for changes made while the page
 * loaded. Returns the function that stops it.
 */
export function startLiveBook(queryClient: QueryClient, onPaused: (paused: boolean) => void): () => void {
  let source: EventSource | null = null;
  let pending: BookChangedEvent | null = null;
  let batchTimer: number | undefined;
  let pausedTimer: number | undefined;
  let retryTimer: number | undefined;
  let failures = 0;
  let lost = false;
  let everOpen = false;

  const heard = (change: BookChangedEvent) => {
    pending = merged(pending, change);
    batchTimer ??= window.setTimeout(() => {
      batchTimer = undefined;
      const change = pending;
      pending = null;
      if (change) void bookChangedElsewhere(queryClient, change);
    }, BATCH_MS);
  };

  const connect = () => {
    const current = new EventSource(urlOf(eventsApi.book));
    source = current;
    current.addEventListener('open', () => {
      failures = 0;
      window.clearTimeout(pausedTimer);
      // The screen read its data before the stream was heard: a change in between (a booking made while the page
      // loaded) was told to nobody, so the first opening reads the same set again, like a reconnection.
      const first = !everOpen;
      everOpen = true;
      if (!lost && !first) return;
      if (lost) onPaused(false);
      lost = false;
      heard(EVERYTHING);
    });
    current.addEventListener(BOOK_CHANGED_EVENT, (message) => {
      try {
        const change = BookChangedEventSchema.safeParse(JSON.parse((message as MessageEvent<string>).data));
        if (change.success) heard(change.data);
      } catch {
        // not JSON: nothing to refresh by
      }
    });
    current.addEventListener('error', () => {
      if (!lost) {
        lost = true;
        pausedTimer = window.setTimeout(() => onPaused(true), PAUSED_AFTER_MS);
      }
      // A dropped stream is reconnected by the browser (after the server's `retry:`); a refused one is not, so we do.
      if (current.readyState === EventSource.CLOSED) {
        current.close();
        retryTimer = window.setTimeout(connect, Math.min(MAX_RETRY_MS, 1_000 * 2 ** failures++));
      }
    });
  };
  connect();

  return () => {
    source?.close();
    window.clearTimeout(batchTimer);
    window.clearTimeout(pausedTimer);
    window.clearTimeout(retryTimer);
  };
}

/** Live updates while the calling component is mounted (the app shell, for staff); whether they are paused right now. */
export function useLiveBook(): { paused: boolean } {
  const queryClient = useQueryClient();
  const [paused, setPaused] = useState(false);
  useEffect(() => startLiveBook(queryClient, setPaused), [queryClient]);
  return { paused };
}
