import autocannon from 'autocannon';

export interface Figures {
  name: string;
  requests: number;
  seconds: number;
  perSecond: number;
  p50: number;
  p95: number;
  p99: number;
  statuses: Record<string, number>;
  serverErrors: number;
  /** Connection errors and timeouts (no HTTP answer at all). */
  errors: number;
}

export interface LoadSpec {
  name: string;
  urls: string[];
  connections: number;
  /** Seconds; or `amount` requests, whichever the spec gives. */
  duration?: number;
  amount?: number;
  method?: 'GET' | 'POST';
  headers?: Record<string, string>;
  /** The path (with query) and body of each request; called per request. */
  next: (i: number) => { path: string; body?: string; headers?: Record<string, string> };
}

// No answer within the run counts as infinitely slow, never as 0 ms.
export const percentile = (sorted: number[], p: number) =>
  sorted.length ? sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]! : Number.POSITIVE_INFINITY;

/** Runs autocannon against every url at once (connections split between them); latencies per answer. */
export async function measure(spec: LoadSpec): Promise<Figures> {
  const latencies: number[] = [];
  const statuses: Record<string, number> = {};
  let errors = 0;
  let counter = 0;
  const started = Date.now();
  await Promise.all(
    spec.urls.map(
      (url) =>
        new Promise<void>((resolve, reject) => {
          const instance = autocannon(
            {
              url,
              connections: Math.max(1, Math.round(spec.connections / spec.urls.length)),
              ...(spec.amount ? { amount: Math.round(spec.amount / spec.urls.length) } : { duration: spec.duration ?? 10 }),
              timeout: 30,
              requests: [
                {
                  method: spec.method ?? 'GET',
                  setupRequest: (req) => {
                    const next = spec.next(counter++);
                    return {
                      ...req,
                      path: next.path,
                      body: next.body,
                      headers: { ...spec.headers, ...(next.body ? { 'content-type': 'application/json' } : {}), ...next.headers },
                    };
                  },
                },
              ],
            },
            (err) => (err ? reject(err) : resolve()),
          );
          instance.on('response', (_client, statusCode, _bytes, responseTime) => {
            latencies.push(responseTime);
            statuses[statusCode] = (statuses[statusCode] ?? 0) + 1;
          });
          instance.on('reqError', () => errors++);
        }),
    ),
  );
  const seconds = (Date.now() - started) / 1000;
  latencies.sort((a, b) => a - b);
  const round = (n: number) => Math.round(n * 10) / 10;
  return {
    name: spec.name,
    requests: latencies.length,
    seconds: round(seconds),
    perSecond: Math.round(latencies.length / seconds),
    p50: round(percentile(latencies, 50)),
    p95: round(percentile(latencies, 95)),
    p99: round(percentile(latencies, 99)),
    statuses,
    serverErrors: Object.entries(statuses)
      .filter(([s]) => Number(s) >= 500)
      .reduce((n, [, c]) => n + c, 0),
    errors,
  };
}

export function printFigures(f: Figures): void {
  console.log(
    `${f.name.padEnd(34)} ${String(f.requests).padStart(6)} req in ${f.seconds}s = ${String(f.perSecond).padStart(5)}/s  ` +
      `p50 ${f.p50} ms  p95 ${f.p95} ms  p99 ${f.p99} ms  5xx ${f.serverErrors}  no-answer ${f.errors}  ${JSON.stringify(f.statuses)}`,
  );
}

/** A different client address per request (the app trusts X-Forwarded-For from its loopback proxy). */
export const someAddress = (i: number) => `10.${(i >> 16) & 255}.${(i >> 8) & 255}.${i & 255}`;

/**
 * Waits until every server answers /api/health quickly again: autocannon stops sending at the deadline,
 * but requests already queued on a saturated server would otherwise slow the next scenario down.
 */
export async function drained(urls: string[], maxSeconds = 180): Promise<number> {
  const started = Date.now();
  for (;;) {
    const t0 = Date.now();
    await Promise.all(
      urls.map((u) =>
        fetch(`${u}/api/health`)
          .then((r) => r.arrayBuffer())
          .catch(() => null),
      ),
    );
    if (Date.now() - t0 < 50 || Date.now() - started > maxSeconds * 1000) return (Date.now() - started) / 1000;
    await new Promise((r) => setTimeout(r, 200));
  }
}
