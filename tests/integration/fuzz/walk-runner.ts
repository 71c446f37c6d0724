import { refreshCsrf, type HttpSession } from '../../bench/load/http-session';
import type { DocumentedRoute } from '../access-matrix/openapi-routes';
import { routeWalk, type WalkCase } from './route-walk';
import type { WalkIds } from './walk-ids';

/** Someone the walk calls as: a name for the report and the session (cookie and CSRF token) to send. */
export interface WalkCaller {
  name: string;
  session: HttpSession;
}

export interface WalkReport {
  requests: number;
  statuses: Map<number, number>;
  /** Each answer that broke a property: 5xx, or a refusal outside the one error shape. */
  failures: string[];
}

// Routes that change whose session a caller holds (signing in, up or out) are walked signed out only.
export const SESSION_CHANGING = new Set(['POST /api/session', 'DELETE /api/session', 'POST /api/sign-up']);

// A caller the route refuses (401/403 before any parsing) gets this many of its cases, spread over the classes.
const REFUSED_SAMPLE = 6;

/** Sends one case as `session` (with its CSRF token on writes); an event stream is read only up to its headers. */
export async function sendCase(baseUrl: string, session: HttpSession, c: WalkCase, headers: Record<string, string> = {}) {
  const abort = new AbortController();
  const res = await fetch(`${baseUrl}${c.path}`, {
    method: c.method.toUpperCase(),
    headers: {
      cookie: session.cookie,
      ...(c.method === 'get' ? {} : { 'x-csrf-token': session.csrf }),
      ...(c.contentType && c.body !== undefined ? { 'content-type': c.contentType } : {}),
      ...headers,
    },
    body: c.method === 'get' || c.body === undefined ? undefined : typeof c.body === 'string' ? c.body : new Uint8Array(c.body),
    signal: abort.signal,
  });
  if (res.headers.get('content-type')?.startsWith('text/event-stream')) {
    abort.abort();
    return { status: res.status, body: null };
  }
  const text = await res.text();
  let body: unknown = text;
  try {
    body = JSON.parse(text);
  } catch {
    // not JSON: kept as text for the report
  }
  return { status: res.status, body };
}

/** What is wrong with an answer, or null: never a 5xx, and every refusal in `{ error: { code, message, requestId } }`. */
export function answerProblem(res: { status: number; body: unknown }): string | null {
  const shown = () => JSON.stringify(res.body).slice(0, 300);
  if (res.status >= 500) return `answered ${res.status} ${shown()}`;
  if (res.status < 400) return null;
  const error = (res.body as { error?: { code?: unknown; message?: unknown; requestId?: unknown } } | null)?.error;
  if (typeof error?.code !== 'string' || typeof error.message !== 'string' || !error.message || typeof error.requestId !== 'string') {
    return `error not in the standard shape: ${res.status} ${shown()}`;
  }
  return null;
}

/**
 * Walks every route with its worst values (route-walk.ts) as every caller, `concurrency` requests at a time.
 * `headers` adds headers per request (a new forwarded address each, so per-address limits do not hide deeper checks).
 */
export async function runWalk(opts: {
  baseUrl: string;
  routes: DocumentedRoute[];
  callers: WalkCaller[];
  anonymous: () => Promise<HttpSession>;
  ids: WalkIds;
  concurrency?: number;
  headers?: () => Record<string, string>;
  /**
   * When set, only the first caller a route lets in gets every case; each later one this many, spread over the
   * value classes (a quicker walk for `npm test`). Unset, every caller that is let in gets every case.
   */
  sampleAfterFirst?: number;
}): Promise<WalkReport> {
  const report: WalkReport = { requests: 0, statuses: new Map(), failures: [] };
  const send = async (who: string, session: HttpSession, c: WalkCase) => {
    report.requests++;
    const res = await sendCase(opts.baseUrl, session, c, opts.headers?.()).catch((err: Error) => ({ status: 599, body: `no answer: ${err.message}` }));
    report.statuses.set(res.status, (report.statuses.get(res.status) ?? 0) + 1);
    const found = answerProblem(res);
    if (found) report.failures.push(`${c.method.toUpperCase()} ${c.path.slice(0, 120)} [${c.label}] as ${who}: ${found}`);
    return res;
  };
  const spread = <T>(items: T[], n: number) => items.filter((_c, i) => i % Math.ceil(items.length / n) === 0);
  for (const route of opts.routes) {
    const cases = routeWalk(route, opts.ids);
    const callers = SESSION_CHANGING.has(route.key) ? [{ name: 'signed out', session: await opts.anonymous() }] : opts.callers;
    let walkedWhole = false;
    for (const caller of callers) {
      const [firstCase, ...rest] = cases;
      if (!firstCase) continue;
      const first = await send(caller.name, caller.session, firstCase);
      const refused = first.status === 401 || first.status === 403;
      const todo = refused ? spread(rest, REFUSED_SAMPLE) : walkedWhole && opts.sampleAfterFirst !== undefined ? spread(rest, opts.sampleAfterFirst) : rest;
      walkedWhole ||= !refused;
      await inParallel(todo, opts.concurrency ?? 4, (c) => send(caller.name, caller.session, c));
      await refreshCsrf(opts.baseUrl, caller.session);
    }
  }
  return report;
}

async function inParallel<T>(items: T[], width: number, work: (item: T) => Promise<unknown>): Promise<void> {
  let next = 0;
  await Promise.all(
    Array.from({ length: Math.min(width, items.length) }, async () => {
      for (let item = items[next++]; item !== undefined; item = items[next++]) await work(item);
    }),
  );
}
