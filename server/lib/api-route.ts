import type { ZodType } from 'zod';
import type { Request, RequestHandler, Response, Router } from 'express';
import type { OpenAPIRegistry } from '@asteasolutions/zod-to-openapi';
import { describeAccess, type Access, type Endpoint, type Method, type Parsed, openApiPath } from '@shared/api/endpoint';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import { ApiErrorBodySchema } from '@shared/api/error.schemas';
import { requireAccess } from '../auth/require-access';
import { JsonText } from './json-text';
import { assertStorable } from './unstorable-text';

export interface RouteContext<E extends Endpoint> {
  body: Parsed<E['body']>;
  query: Parsed<E['query']>;
  params: Parsed<E['params']>;
  /** The signed-in user; never null on routes whose access is not `public`. */
  user: SessionUser;
  req: Request;
  res: Response;
}

/** Every route the API serves, for the OpenAPI document, the access-matrix tests and the contract check. */
export interface RouteRecord {
  method: Method;
  path: string;
  access: Access;
  endpoint: Endpoint;
}

export interface RouteTable {
  router: Router;
  registry: OpenAPIRegistry;
  records: RouteRecord[];
  /** Development and tests check every JSON answer against its endpoint's response schema. */
  checkResponses: boolean;
}

/**
 * Serves one endpoint of `shared/api/`: access check, zod parsing of body/query/params, its OpenAPI
 * entry, and (in development and tests) a check of the answer against the endpoint's response schema.
 * The handler returns the response body; thrown errors reach the error middleware. `before` runs after the
 * access check and before parsing (a rate limit, a form-body parser).
 */
export function apiRoute<const E extends Endpoint>(
  table: RouteTable,
  spec: E,
  handler: (ctx: RouteContext<E>) => Promise<unknown>,
  before: RequestHandler[] = [],
): void {
  const status = spec.status ?? 200;
  table.records.push({ method: spec.method, path: spec.path, access: spec.access, endpoint: spec });
  register(table.registry, spec, status);
  table.router[spec.method](spec.path, requireAccess(spec.access), ...before, async (req: Request, res: Response) => {
    // A raw body is bytes for a signature check, read by the handler itself.
    const raw = spec.bodyType === 'raw';
    assertStorable({ params: req.params, query: req.query, body: raw ? undefined : req.body });
    const ctx = {
      body: spec.body && !raw ? spec.body.parse(req.body ?? {}) : undefined,
      query: spec.query ? spec.query.parse(req.query) : undefined,
      params: spec.params ? spec.params.parse(req.params) : undefined,
      user: req.user as SessionUser,
      req,
      res,
    } as RouteContext<E>;
    const result = await handler(ctx);
    // A handler that answered by itself (image bytes, an event stream it keeps open) is left alone.
    if (res.headersSent) return;
    // A handler may pick another status itself (health answers 503 with a body); otherwise the declared one.
    const chosen = res.statusCode !== 200 ? res.statusCode : status;
    if (table.checkResponses) checkAnswer(spec, result);
    if (chosen === 204 || result === undefined) res.status(chosen === 200 ? 204 : chosen).end();
    else if (result instanceof JsonText) sendJsonText(req, res.status(chosen), result);
    else res.status(chosen).json(result);
  });
}

/** An answer its contract does not describe is the server's fault: a 500 in development and tests, never silence. */
function checkAnswer(spec: Endpoint, result: unknown) {
  if (!spec.response || result === undefined) return;
  const value = result instanceof JsonText ? JSON.parse(result.body.toString()) : JSON.parse(JSON.stringify(result));
  const checked = spec.response.safeParse(value);
  if (!checked.success) {
    const where = checked.error.issues.slice(0, 3).map((i) => `${i.path.join('.') || '(root)'}: ${i.message}`);
    throw new Error(`${spec.method.toUpperCase()} ${spec.path} answered outside its contract: ${where.join('; ')}`);
  }
}

/** A cached answer as its stored bytes; a browser revalidating with the entity tag gets 304 from send(). */
function sendJsonText(req: Request, res: Response, json: JsonText) {
  res.type('json').set({ ETag: json.etag, 'Cache-Control': 'private, no-cache', Vary: 'Accept-Encoding' });
  if (json.gzipped && req.acceptsEncodings('gzip')) res.set('Content-Encoding', 'gzip').send(json.gzipped);
  else res.send(json.body);
}

/** How the success answer is documented: JSON, or an event stream whose events carry the schema as their data. */
function answer(spec: Endpoint, schema: ZodType) {
  return { content: { [spec.answers === 'event-stream' ? 'text/event-stream' : 'application/json']: { schema } } };
}

function register(registry: OpenAPIRegistry, spec: Endpoint, status: number) {
  const json = (schema: ZodType) => ({ content: { 'application/json': { schema } } });
  const errors = Object.fromEntries(
    errorStatuses(spec.access, Boolean(spec.body || spec.query || spec.params)).map((s) => [s, { description: 'Error', ...json(ApiErrorBodySchema) }]),
  );
  registry.registerPath({
    method: spec.method,
    path: openApiPath(spec.path),
    summary: spec.summary,
    description: `Access: ${describeAccess(spec.access)}`,
    request: {
      ...(spec.body && { body: spec.bodyType === 'form' ? { content: { 'application/x-www-form-urlencoded': { schema: spec.body } } } : json(spec.body) }),
      ...(spec.query && { query: spec.query as never }),
      ...(spec.params && { params: spec.params as never }),
    },
    responses: {
      [status]: { description: 'Success', ...(spec.response && status !== 204 ? answer(spec, spec.response) : {}) },
      ...errors,
    },
  });
}

export function errorStatuses(access: Access, hasInput: boolean): number[] {
  const list = hasInput ? [400] : [];
  if (access !== 'public') list.push(401, 403);
  return list;
}
