import { z } from 'zod';
import type { BookChangedEvent } from '@shared/schemas/live-events.schemas';
import { listenToChannel, type ChannelListener } from '@server/db/channel-listener';

/** The channel the book-version triggers notify (migrations/20261207T0900_add_book_change_notifications.ts). */
export const BOOK_CHANNEL = 'dwell_book';

/** What the triggers send: the salon, the local dates (null: every date) and the booking, where known. */
const NotificationSchema = z.object({ salonId: z.string(), dates: z.array(z.string()).nullable(), bookingId: z.string().nullable() });

export type Deliver = (event: BookChangedEvent) => void;

export interface LiveHub {
  /** Adds a stream of a salon; null when this server already holds as many as it allows. */
  subscribe(salonId: string, deliver: Deliver): { ready: Promise<void>; unsubscribe(): void } | null;
  /** Open streams on this server. */
  size(): number;
  stop(): Promise<void>;
}

export interface LiveHubOptions {
  databaseUrl: string;
  /** Streams this server holds at most (each is an open connection and a little memory). */
  maxStreams: number;
  /** A transaction's notifications arrive together; those of one salon this close are told as one event. */
  mergeMs?: number;
  /** The LISTEN connection is closed this long after the last stream went, and opened again with the next. */
  idleMs?: number;
  /** How long a new stream waits for LISTEN before it is answered anyway. */
  readyTimeoutMs?: number;
}

/**
 * Fans the book's notifications out to this app server's open streams, by salon. One LISTEN connection per
 * server, opened with the first stream and closed a while after the last one, so a server nobody watches
 * holds no connection. Other servers hear the same notifications through PostgreSQL.
 */
export function createLiveHub({ databaseUrl, maxStreams, mergeMs = 25, idleMs = 10_000, readyTimeoutMs = 5_000 }: LiveHubOptions): LiveHub {
  const streams = new Map<string, Set<Deliver>>();
  const pending = new Map<string, { dates: Set<string>; everyDate: boolean; bookingIds: Set<string> }>();
  let count = 0;
  let listener: ChannelListener | null = null;
  let idleTimer: NodeJS.Timeout | null = null;

  const send = (salonId: string, event: BookChangedEvent) => {
    for (const deliver of streams.get(salonId) ?? []) deliver(event);
  };

  const flush = (salonId: string) => {
    const change = pending.get(salonId);
    pending.delete(salonId);
    if (!change) return;
    send(salonId, {
      dates: change.everyDate ? [] : [...change.dates].sort(),
      everyDate: change.everyDate,
      bookingIds: [...change.bookingIds],
    });
  };

  const heard = (payload: string) => {
    let parsed: z.infer<typeof NotificationSchema>;
    try {
      parsed = NotificationSchema.parse(JSON.parse(payload));
    } catch {
      return; // not ours to tell; a malformed payload must not stop the others
    }
    if (!streams.has(parsed.salonId)) return;
    let change = pending.get(parsed.salonId);
    if (!change) {
      change = { dates: new Set(), everyDate: false, bookingIds: new Set() };
      pending.set(parsed.salonId, change);
      setTimeout(() => flush(parsed.salonId), mergeMs).unref();
    }
    if (parsed.dates === null) change.everyDate = true;
    else for (const date of parsed.dates) change.dates.add(date);
    if (parsed.bookingId) change.bookingIds.add(parsed.bookingId);
  };

  // Notifications sent while the connection was down are lost: every stream is told to read everything again.
  const reconnected = () => {
    for (const salonId of streams.keys()) send(salonId, { dates: [], everyDate: true, bookingIds: [] });
  };

  const listening = (): Promise<void> => {
    if (idleTimer) clearTimeout(idleTimer);
    idleTimer = null;
    listener ??= listenToChannel(databaseUrl, BOOK_CHANNEL, { onMessage: heard, onReconnected: reconnected });
    const timeout = new Promise<void>((resolve) => setTimeout(resolve, readyTimeoutMs).unref());
    return Promise.race([listener.ready(), timeout]);
  };

  const closeListener = async () => {
    if (idleTimer) clearTimeout(idleTimer);
    idleTimer = null;
    const current = listener;
    listener = null;
    await current?.close();
  };

  return {
    subscribe(salonId, deliver) {
      if (count >= maxStreams) return null;
      count++;
      let set = streams.get(salonId);
      if (!set) streams.set(salonId, (set = new Set()));
      set.add(deliver);
      const ready = listening();
      let gone = false;
      return {
        ready,
        unsubscribe() {
          if (gone) return;
          gone = true;
          count--;
          set.delete(deliver);
          if (set.size === 0 && streams.get(salonId) === set) streams.delete(salonId);
          if (count === 0) {
            idleTimer = setTimeout(() => void closeListener(), idleMs);
            idleTimer.unref();
          }
        },
      };
    },
    size: () => count,
    stop: closeListener,
  };
}
