import type { Request, Response } from 'express';

export interface EventStream {
  send(event: string, data: unknown): void;
  close(): void;
}

export interface EventStreamOptions {
  /** A comment line this often keeps proxies and load balancers from closing a quiet connection. */
  heartbeatMs: number;
  /** How long the browser's EventSource waits before reconnecting after a lost connection. */
  retryMs: number;
  /** Called once when the stream ends, whoever ended it. */
  onClose(): void;
}

/**
 * Takes over a response as a `text/event-stream` (server-sent events, WHATWG HTML "Server-sent events"): the
 * headers at once, the `retry:` hint, a heartbeat comment, and clean-up when either side ends it.
 */
export function openEventStream(req: Request, res: Response, { heartbeatMs, retryMs, onClose }: EventStreamOptions): EventStream {
  res.status(200).set({
    'Content-Type': 'text/event-stream; charset=utf-8',
    'Cache-Control': 'no-store',
    Connection: 'keep-alive',
    // Proxies that buffer answers (nginx) would hold events back.
    'X-Accel-Buffering': 'no',
  });
  res.flushHeaders();
  req.socket.setNoDelay(true);
  req.socket.setTimeout(0); // quiet between heartbeats is normal here
  res.write(`retry: ${retryMs}\n: live\n\n`);

  const heartbeat = setInterval(() => res.write(': heartbeat\n\n'), heartbeatMs);
  heartbeat.unref();
  let open = true;
  const close = () => {
    if (!open) return;
    open = false;
    clearInterval(heartbeat);
    onClose();
    if (!res.writableEnded) res.end();
  };
  res.on('close', close);
  res.on('error', close);

  return {
    send(event, data) {
      if (open) res.write(`event: ${event}\ndata: ${JSON.stringify(data)}\n\n`);
    },
    close,
  };
}
