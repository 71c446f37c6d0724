import { queryOptions } from '@tanstack/react-query';
import type { z } from 'zod';
import { urlOf, type Answer, type CallInput, type Endpoint } from '@shared/api/endpoint';
import { ApiErrorBodySchema } from '@shared/api/error.schemas';
import { sessionApi } from '@shared/api/session.api';
import { ApiError } from './api-error';

/*
 * The one way the client talks to the API. It parses responses with the shared
 * schemas and throws ApiError; it never redirects or shows messages (the query
 * cache and the pages decide that).
 */

type WriteMethod = 'POST' | 'PUT' | 'PATCH' | 'DELETE';

let csrfToken: string | null = null;

async function send(method: 'GET' | WriteMethod, path: string, body?: unknown): Promise<Response> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (body !== undefined) headers['Content-Type'] = 'application/json';
  if (method !== 'GET') headers['X-CSRF-Token'] = await getCsrfToken();
  try {
    return await fetch(path, {
      method,
      headers,
      credentials: 'same-origin',
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    throw new ApiError(0, 'NETWORK', 'Dwell could not reach the server. Check your connection and try again.');
  }
}

/** The session's CSRF token, fetched once; also used by upload-file.ts for multipart writes. */
export async function getCsrfToken(): Promise<string> {
  if (csrfToken) return csrfToken;
  const response = await send('GET', sessionApi.csrf.path);
  csrfToken = (await readBody(response, sessionApi.csrf.response)).token;
  return csrfToken;
}

/** Drops the token so the next write fetches a fresh one (it is bound to the session). */
export function forgetCsrfToken(): void {
  csrfToken = null;
}

export async function toApiError(response: Response): Promise<ApiError> {
  const parsed = ApiErrorBodySchema.safeParse(await response.json().catch(() => null));
  if (parsed.success) {
    const { code, message, fields } = parsed.data.error;
    return new ApiError(response.status, code, message, fields);
  }
  return new ApiError(response.status, 'INTERNAL', 'Something went wrong on our side. Please try again.');
}

async function readBody<S extends z.ZodType>(response: Response, schema: S): Promise<z.output<S>> {
  if (!response.ok) throw await toApiError(response);
  return schema.parse(await response.json());
}

export function apiGet<S extends z.ZodType>(path: string, schema: S): Promise<z.output<S>> {
  return send('GET', path).then((response) => readBody(response, schema));
}

/** A write. Returns the parsed body, or undefined when no schema is given (204/202 answers). */
export async function apiWrite<S extends z.ZodType>(method: WriteMethod, path: string, body?: unknown, schema?: S): Promise<z.output<S>> {
  let response = await send(method, path, body);
  if (response.status === 403) {
    const error = await toApiError(response.clone());
    // The token belongs to the session, so it goes stale on sign-in and sign-out: fetch a fresh one once.
    if (error.code === 'CSRF') {
      csrfToken = null;
      response = await send(method, path, body);
    }
  }
  if (!response.ok) throw await toApiError(response);
  return schema ? schema.parse(await response.json()) : (undefined as z.output<S>);
}

/** Builds `path?key=value` leaving out empty values. */
export function withQuery(path: string, query: Record<string, string | undefined>): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value) params.set(key, value);
  const text = params.toString();
  return text ? `${path}?${text}` : path;
}

/** The input argument of an endpoint: optional when the endpoint takes no params and no body. */
export type InputArgs<E extends Endpoint> = object extends CallInput<E> ? [input?: CallInput<E>] : [input: CallInput<E>];

/**
 * Calls one endpoint of `shared/api/`: its path filled from `params`, `query` appended, `body` sent as
 * JSON, and the answer parsed with the endpoint's response schema (undefined for empty answers).
 */
export function callApi<const E extends Endpoint>(e: E, ...[input]: InputArgs<E>): Promise<Answer<E>> {
  const url = urlOf(e, input ?? {});
  const schema = e.response as z.ZodType | undefined;
  if (e.method === 'get') return send('GET', url).then((response) => (schema ? readBody(response, schema) : checkOk(response))) as Promise<Answer<E>>;
  return apiWrite(e.method.toUpperCase() as WriteMethod, url, input?.body, schema) as Promise<Answer<E>>;
}

async function checkOk(response: Response): Promise<undefined> {
  if (!response.ok) throw await toApiError(response);
  return undefined;
}

/**
 * The query key of an endpoint's answer: `['api', path template, params, query]`. A prefix of it names
 * a set to invalidate: every answer of the endpoint, or of one record (see cache-rules.ts).
 */
export function apiKey<E extends Endpoint>(e: E, input: { params?: unknown; query?: unknown } = {}) {
  return ['api', e.path, input.params ?? {}, input.query ?? {}] as const;
}

/** TanStack Query options for a GET endpoint; spread them to add options (`{ ...apiQuery(e, input), staleTime }`). */
export function apiQuery<const E extends Endpoint>(e: E, ...[input]: InputArgs<E>) {
  return queryOptions({
    queryKey: apiKey(e, input ?? {}),
    queryFn: () => callApi(e, ...([input] as InputArgs<E>)),
  });
}
