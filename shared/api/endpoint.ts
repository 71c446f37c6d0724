import type { z, ZodType } from 'zod';
import type { Role } from '../schemas/common.schemas';

/** Who may call an endpoint: anyone, any signed-in user, or the listed roles. */
export type Access = 'public' | 'signed_in' | readonly Role[];

export const STAFF: readonly Role[] = ['front_desk', 'stylist', 'owner'];
export const DESK: readonly Role[] = ['front_desk', 'owner'];
export const CLIENT_OR_STAFF: readonly Role[] = ['client', ...STAFF];

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

/** Where every endpoint's path starts; the server mounts its JSON parser, CSRF check and API 404 here. */
export const API_ROOT = '/api';

/**
 * One API endpoint, the single place its method, path, inputs, answer and access are written. The
 * server registers its handler from this object (server/lib/api-route.ts), the client builds its
 * fetcher and query options from it (src/lib/api-client.ts), and the OpenAPI document is generated
 * from it; nothing else spells an `/api/` path.
 */
export interface Endpoint {
  method: Method;
  /** Express-style path, `:name` for a parameter, e.g. `/api/clients/:id`. */
  path: string;
  access: Access;
  summary: string;
  params?: ZodType;
  query?: ZodType;
  body?: ZodType;
  /**
   * How the body arrives: JSON by default; `form` for providers' form webhooks; `raw` for a provider's JSON webhook
   * whose signature covers the exact bytes (the handler reads them from `req.body`; `body` only documents it);
   * `multipart` for uploads.
   */
  bodyType?: 'json' | 'form' | 'raw' | 'multipart';
  /** The JSON answer (for an event stream, each event's data); absent when the answer is empty (204/202) or a file. */
  response?: ZodType;
  /**
   * `file` when the answer is bytes (an image, a CSV, an .ics) rather than JSON; `event-stream` when it is a
   * `text/event-stream` that stays open (server-sent events), its handler writing the response itself.
   */
  answers?: 'json' | 'file' | 'event-stream';
  /** Status on success; 204 answers no body. */
  status?: 200 | 201 | 202 | 204;
  /** For `multipart` bodies: the field that carries the files and the limits on them. */
  upload?: UploadLimits;
}

export interface UploadLimits {
  fileField: string;
  maxFiles: number;
  maxBytesPerFile: number;
}

/**
 * Where an endpoint answers, without its schemas: what a page needs to call the endpoint when it must not load
 * the validation library (the public salon page, a visitor's first load, and the app frame around every page).
 * Its answer is used as sent; the server checks every answer against the endpoint's response schema in
 * development and tests (server/lib/api-route.ts). Declare it beside its endpoint in the contract module and
 * spread it into the endpoint, so the path is written once.
 */
export interface Address<E extends Endpoint = Endpoint> {
  method: E['method'];
  path: E['path'];
  /** Type only, never set: the endpoint whose inputs and answer this address carries. */
  readonly endpoint?: E;
}

/** The endpoint an address or endpoint stands for. */
export type EndpointOf<A extends Address> = A extends Endpoint ? A : A extends Address<infer E extends Endpoint> ? E : never;

/** Declares an endpoint; `const` keeps the literal path and the schema types for both sides. */
export function endpoint<const E extends Endpoint>(spec: E): E {
  return spec;
}

type Input<S> = S extends ZodType ? z.input<S> : never;
type Output<S> = S extends ZodType ? z.output<S> : undefined;

/** What a caller sends: the parameters, query and body the endpoint declares, and no others. */
export type CallInput<E extends Endpoint> = ([E['params']] extends [ZodType] ? { params: Input<E['params']> } : { params?: never }) &
  ([E['query']] extends [ZodType] ? { query?: Input<E['query']> } : { query?: never }) &
  ([E['body']] extends [ZodType] ? { body: Input<E['body']> } : { body?: never });

/** What the endpoint answers, as parsed by its response schema. */
export type Answer<E extends Endpoint> = Output<E['response']>;

/** Parsed inputs as the server's handler sees them. */
export type Parsed<S> = S extends ZodType ? z.output<S> : undefined;

/**
 * The URL of an endpoint with its parameters filled in (each one URL-encoded) and its query appended,
 * leaving out empty values: `urlOf(clientsApi.one, { params: { id } })` → `/api/clients/…`.
 */
export function urlOf(e: Pick<Endpoint, 'path'>, input: { params?: unknown; query?: unknown } = {}): string {
  const values = (input.params ?? {}) as Record<string, unknown>;
  const path = e.path.replace(/:(\w+)/g, (_match, name: string) => {
    const value = values[name];
    if (value === undefined || value === null || value === '') throw new Error(`urlOf: no value for :${name} in ${e.path}`);
    return encodeURIComponent(String(value));
  });
  // Built by hand: shared/ runs on both sides and declares neither the DOM's nor node's URLSearchParams.
  const pairs: string[] = [];
  for (const [key, value] of Object.entries((input.query ?? {}) as Record<string, unknown>)) {
    if (value === undefined || value === null || value === '') continue;
    for (const one of Array.isArray(value) ? value : [value]) pairs.push(`${encodeURIComponent(key)}=${encodeURIComponent(String(one))}`);
  }
  return pairs.length ? `${path}?${pairs.join('&')}` : path;
}

/** The OpenAPI form of a path: `/api/clients/:id` → `/api/clients/{id}`. */
export function openApiPath(path: string): string {
  return path.replace(/:(\w+)/g, '{$1}');
}

/** Access in words, for the OpenAPI document. */
export function describeAccess(access: Access): string {
  if (access === 'public') return 'anyone';
  if (access === 'signed_in') return 'any signed-in user';
  return (access as readonly Role[]).join(', ');
}
