import type { Request, Response, Router } from 'express';
import type { OpenAPIRegistry } from '@asteasolutions/zod-to-openapi';
import type { z, ZodType } from 'zod';
import type { Role } from '../../shared/schemas/common.schemas';
import type { SessionUser } from '../../shared/schemas/auth.schemas';
import { ApiErrorBodySchema } from '../../shared/api/error.schemas';
import { requireAccess, type Access } from '../auth/require-access';
import { JsonText } from './json-text';
import { assertStorable } from './unstorable-text';

type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

export interface RouteSpec<B extends ZodType, Q extends ZodType, P extends ZodType> {
  method: Method;
  /** Express path, e.g. `/api/clients/:id`. */
  path: string;
  access: Access;
  summary: string;
  body?: B;
  /** How the body arrives; `form` for providers' webhooks (application/x-www-form-urlencoded). JSON by default. */
  bodyType?: 'json' | 'form';
  query?: Q;
  params?: P;
  response?: ZodType;
  /** Status on success; 204 answers no body. */
  status?: 200 | 201 | 202 | 204;
}

export interface RouteContext<B, Q, P> {
  body: B;
  query: Q;
  params: P;
  /** The signed-in user; never null on routes whose access is not `public`. */
  user: SessionUser;
  req: Request;
  res: Response;
}

/** Every route the API serves, for the OpenAPI document and the access-matrix tests. */
export interface RouteRecord {
  method: Method;
  path: string;
  access: Access;
}

export interface RouteTable {
  router: Router;
  registry: OpenAPIRegistry;
  records: RouteRecord[];
}

type Infer<T> = T extends ZodType ? z.infer<T> : undefined;

/**
 * Declares one API route: access check, zod parsing of body/query/params, and its OpenAPI entry, from
 * the same schemas. The handler returns the response body; thrown errors reach the error middleware.
 */
export function apiRoute<B extends ZodType, Q extends ZodType, P extends ZodType>(
  table: RouteTable,
  spec: RouteSpec<B, Q, P>,
  handler: (ctx: RouteContext<Infer<B>, Infer<Q>, Infer<P>>) => Promise<unknown>,
): void {
  const status = spec.status ?? 200;
  table.records.push({ method: spec.method, path: spec.path, access: spec.access });
  register(table.registry, spec, status);
  table.router[spec.method](spec.path, requireAccess(spec.access), async (req: Request, res: Response) => {
    assertStorable({ params: req.params, query: req.query, body: req.body });
    const ctx = {
      body: spec.body ? spec.body.parse(req.body ?? {}) : undefined,
      query: spec.query ? spec.query.parse(req.query) : undefined,
      params: spec.params ? spec.params.parse(req.params) : undefined,
      user: req.user as SessionUser,
      req,
      res,
    } as RouteContext<Infer<B>, Infer<Q>, Infer<P>>;
    const result = await handler(ctx);
    // A handler that answered by itself (image bytes) is left alone.
    if (res.headersSent) return;
    // A handler may pick another status itself (health answers 503 with a body); otherwise the declared one.
    const chosen = res.statusCode !== 200 ? res.statusCode : status;
    if (chosen === 204 || result === undefined) res.status(chosen === 200 ? 204 : chosen).end();
    else if (result instanceof JsonText) sendJsonText(req, res.status(chosen), result);
    else res.status(chosen).json(result);
  });
}

/** A cached answer as its stored bytes; a browser revalidating with the entity tag gets 304 from send(). */
function sendJsonText(req: Request, res: Response, json: JsonText) {
  res.type('json').set({ ETag: json.etag, 'Cache-Control': 'private, no-cache', Vary: 'Accept-Encoding' });
  if (json.gzipped && req.acceptsEncodings('gzip')) res.set('Content-Encoding', 'gzip').send(json.gzipped);
  else res.send(json.body);
}

function register(registry: OpenAPIRegistry, spec: RouteSpec<ZodType, ZodType, ZodType>, status: number) {
  const json = (schema: ZodType) => ({ content: { 'application/json': { schema } } });
  const errors = Object.fromEntries(
    errorStatuses(spec.access, Boolean(spec.body || spec.query || spec.params)).map((s) => [
      s,
      { description: 'Error', ...json(ApiErrorBodySchema) },
    ]),
  );
  registry.registerPath({
    method: spec.method,
    path: spec.path.replace(/:(\w+)/g, '{$1}'),
    summary: spec.summary,
    description: `Access: ${describeAccess(spec.access)}`,
    request: {
      ...(spec.body && { body: spec.bodyType === 'form' ? { content: { 'application/x-www-form-urlencoded': { schema: spec.body } } } : json(spec.body) }),
      ...(spec.query && { query: spec.query as never }),
      ...(spec.params && { params: spec.params as never }),
    },
    responses: {
      [status]: { description: 'Success', ...(spec.response && status !== 204 ? json(spec.response) : {}) },
      ...errors,
    },
  });
}

export function errorStatuses(access: Access, hasInput: boolean): number[] {
  const list = hasInput ? [400] : [];
  if (access !== 'public') list.push(401, 403);
  return list;
}

export function describeAccess(access: Access): string {
  if (access === 'public') return 'anyone';
  if (access === 'signed_in') return 'any signed-in user';
  return (access as readonly Role[]).join(', ');
}
