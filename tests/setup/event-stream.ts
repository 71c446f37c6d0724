import type { Test } from 'supertest';

/** One server-sent event as the browser's EventSource would hand it over. */
export interface StreamEvent {
  event: string;
  data: string;
}

/**
 * Reads a response that may be an endless `text/event-stream` as supertest would any other: an event stream is
 * read up to its first blank line (its opening) and then closed, anything else whole (JSON parsed as usual). The
 * suites that walk every documented route use it so an open stream does not hold them up.
 */
export function headOfStream(test: Test): Test {
  return test.buffer(true).parse((res, done) => {
    let text = '';
    let finished = false;
    const finish = () => {
      if (finished) return;
      finished = true;
      const json = /json/.test(String(res.headers['content-type'] ?? ''));
      try {
        done(null, json && text ? JSON.parse(text) : text);
      } catch (err) {
        done(err as Error, text);
      }
    };
    const streaming = String(res.headers['content-type'] ?? '').startsWith('text/event-stream');
    res.setEncoding('utf8');
    res.on('data', (chunk: string) => {
      text += chunk;
      if (streaming && text.includes('\n\n')) {
        finish();
        (res as unknown as { destroy(): void }).destroy(); // an IncomingMessage underneath: closes the connection
      }
    });
    res.on('end', finish);
    res.on('close', finish);
  });
}

/** Whether the OpenAPI operation answers an event stream (its success answer is `text/event-stream`). */
export function answersEventStream(operation: { responses?: Record<string, { content?: Record<string, unknown> }> }): boolean {
  return Object.values(operation.responses ?? {}).some((r) => r.content && 'text/event-stream' in r.content);
}

export interface OpenStream {
  status: number;
  /** The opening lines were received: from here on the server tells this stream of changes. */
  events: StreamEvent[];
  /** The next event named `event` (after those already taken), or a rejection after `timeoutMs`. */
  next(event: string, timeoutMs?: number): Promise<StreamEvent>;
  /** Resolves when the server ended the stream. */
  ended: Promise<void>;
  close(): void;
}

/** Opens an event stream over real HTTP (fetch), as a second screen would, with the session's cookie. */
export async function openStream(url: string, cookie: string): Promise<OpenStream> {
  const abort = new AbortController();
  const res = await fetch(url, { headers: { cookie, accept: 'text/event-stream' }, signal: abort.signal });
  const events: StreamEvent[] = [];
  const waiters: (() => void)[] = [];
  let taken = 0;
  let ended: Promise<void> = Promise.resolve();
  if (res.ok && res.body) {
    const reader = res.body.pipeThrough(new TextDecoderStream()).getReader();
    let buffer = '';
    let opened: () => void;
    const opening = new Promise<void>((resolve) => (opened = resolve));
    ended = (async () => {
      try {
        for (;;) {
          const { value, done } = await reader.read();
          if (done) break;
          buffer += value;
          let cut: number;
          while ((cut = buffer.indexOf('\n\n')) >= 0) {
            const block = buffer.slice(0, cut);
            buffer = buffer.slice(cut + 2);
            opened!();
            const lines = block.split('\n');
            const field = (name: string) =>
              lines
                .filter((l) => l.startsWith(`${name}:`))
                .map((l) => l.slice(name.length + 1).trimStart())
                .join('\n');
            if (lines.some((l) => l.startsWith('data:'))) {
              events.push({ event: field('event') || 'message', data: field('data') });
              waiters.splice(0).forEach((wake) => wake());
            }
          }
        }
      } catch {
        // aborted by close()
      } finally {
        opened!();
        waiters.splice(0).forEach((wake) => wake());
      }
    })();
    await opening;
  } else {
    await res.text();
  }
  let closed = false;
  ended.finally(() => (closed = true));
  return {
    status: res.status,
    events,
    async next(event, timeoutMs = 5_000) {
      const deadline = Date.now() + timeoutMs;
      for (;;) {
        const index = events.findIndex((e, i) => i >= taken && e.event === event);
        if (index >= 0) {
          taken = index + 1;
          return events[index]!;
        }
        if (closed) throw new Error(`the stream ended before a "${event}" event`);
        const left = deadline - Date.now();
        if (left <= 0) throw new Error(`no "${event}" event within ${timeoutMs} ms`);
        await new Promise<void>((resolve) => {
          const timer = setTimeout(resolve, left);
          waiters.push(() => {
            clearTimeout(timer);
            resolve();
          });
        });
      }
    },
    ended,
    close: () => abort.abort(),
  };
}
