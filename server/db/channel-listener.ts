import pg from 'pg';

export interface ChannelListener {
  /** Resolves once LISTEN is in place (after the first connection, or the next reconnection). */
  ready(): Promise<void>;
  close(): Promise<void>;
}

export interface ListenOptions {
  /** Each NOTIFY payload on the channel. */
  onMessage(payload: string): void;
  /** LISTEN is back after a lost connection: whatever was notified meanwhile was missed. */
  onReconnected(): void;
  /** First wait before reconnecting, doubled each failure up to `maxBackoffMs`. */
  backoffMs?: number;
  maxBackoffMs?: number;
}

/**
 * One dedicated connection LISTENing on a channel (the pool's connections come and go, and LISTEN belongs to a
 * session). A lost connection is replaced with backoff and jitter, so a restarted PostgreSQL does not see every
 * app server at once; TCP keep-alive finds a connection that died without a word.
 */
export function listenToChannel(databaseUrl: string, channel: string, options: ListenOptions): ChannelListener {
  const { onMessage, onReconnected, backoffMs = 250, maxBackoffMs = 15_000 } = options;
  let client: pg.Client | null = null;
  let closed = false;
  let failures = 0;
  let everConnected = false;
  let retryTimer: NodeJS.Timeout | null = null;
  let listening: Promise<void>;
  let markListening: () => void = () => {};
  const waitForListening = () => {
    listening = new Promise((resolve) => (markListening = resolve));
  };
  waitForListening();

  const connect = async () => {
    retryTimer = null;
    if (closed) return;
    const next = new pg.Client({ connectionString: databaseUrl, keepAlive: true, keepAliveInitialDelayMillis: 10_000 });
    let lost = false;
    const onLost = () => {
      if (lost) return;
      lost = true;
      if (client === next) client = null;
      next.end().catch(() => {});
      if (closed) return;
      waitForListening();
      const wait = Math.min(maxBackoffMs, backoffMs * 2 ** failures++);
      retryTimer = setTimeout(() => void connect(), wait / 2 + Math.random() * (wait / 2));
      retryTimer.unref();
    };
    next.on('error', onLost);
    next.on('end', onLost);
    next.on('notification', (message) => {
      if (message.channel === channel && message.payload !== undefined) onMessage(message.payload);
    });
    try {
      await next.connect();
      await next.query(`LISTEN ${pg.escapeIdentifier(channel)}`);
    } catch {
      onLost();
      return;
    }
    if (closed) {
      await next.end().catch(() => {});
      return;
    }
    client = next;
    failures = 0;
    if (everConnected) onReconnected();
    everConnected = true;
    markListening();
  };
  void connect();

  return {
    ready: () => listening,
    async close() {
      closed = true;
      if (retryTimer) clearTimeout(retryTimer);
      const current = client;
      client = null;
      markListening(); // nobody waits forever on a listener that is gone
      await current?.end().catch(() => {});
    },
  };
}
