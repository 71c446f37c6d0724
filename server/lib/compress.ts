import compression from 'compression';
import type { RequestHandler } from 'express';

/**
 * gzip or brotli, as the browser accepts, for API answers and static files over 1 kB. Never for an event stream:
 * compression buffers its output, and a live update must reach the screen when it is written, not when a buffer
 * fills (GET /api/events). Cached reads arrive already gzipped (Content-Encoding set) and are left as they are.
 */
export function compress(): RequestHandler {
  return compression({
    filter: (req, res) => !String(res.getHeader('Content-Type') ?? '').startsWith('text/event-stream') && compression.filter(req, res),
  });
}
