import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import type { Express } from 'express';
import { pinoHttp } from 'pino-http';
import { logger } from './logger';

// A request id a trusted proxy passes on is kept (so one id follows the request through the proxy's logs and ours);
// it must look like an id, not like text to inject into a log line.
const REQUEST_ID = /^[\w.:-]{1,100}$/;

/** The path and query as logged: secret link tokens (offers, password resets) and secret query values masked. */
export function requestLine(url: string): string {
  const [path = '', query] = url.split('?', 2);
  const masked = path.replace(/\/offers\/[^/]+/, '/offers/[redacted]');
  if (query === undefined) return masked;
  const params = query
    .split('&')
    .map((pair) => (/^(token|secret|key|password)=/i.test(pair) ? `${pair.split('=', 1)[0]}=[redacted]` : pair))
    .join('&');
  return `${masked}?${params}`;
}

/**
 * One JSON line per request when its answer is finished: method, path, status, time taken, the signed-in user's
 * id and the request id, which is also sent back as `X-Request-Id` and put in every error body (error-handler.ts).
 * 5xx answers log at error level with the error's stack; everything else at info.
 */
export function installRequestLog(app: Express): void {
  app.use(
    pinoHttp<IncomingMessage & { user?: { id: string } }, ServerResponse>({
      logger,
      genReqId: (req, res) => {
        const offered = req.headers['x-request-id'];
        const trusted = (app.get('trust proxy fn') as (address: string, hop: number) => boolean)(req.socket.remoteAddress ?? '', 0);
        const id = trusted && typeof offered === 'string' && REQUEST_ID.test(offered) ? offered : randomUUID();
        res.setHeader('X-Request-Id', id);
        return id;
      },
      customLogLevel: (_req, res, err) => (err || res.statusCode >= 500 ? 'error' : 'info'),
      customProps: (req) => (req.user ? { userId: req.user.id } : {}),
      serializers: {
        // The client's address as the rate limits see it (req.ip: the proxy's X-Forwarded-For when TRUST_PROXY believes it).
        req: (req: { id: string; method: string; url: string; remoteAddress?: string; raw?: { ip?: string } }) => ({
          id: req.id,
          method: req.method,
          url: requestLine(req.url),
          remoteAddress: req.raw?.ip ?? req.remoteAddress,
        }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
    }),
  );
}
