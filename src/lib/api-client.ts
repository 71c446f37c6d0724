import { queryOptions } from '@tanstack/react-query';
import { urlOf, type Address, type Answer, type CallInput, type Endpoint, type EndpointOf } from '@shared/api/endpoint';
import { firstLoadAddresses } from '@shared/api/first-load-addresses';
import { ApiError, errorBodyOf } from './api-error';

/*
 * The one way the client talks to the API. It parses responses with the shared
 * schemas (an Address, which has none, takes the answer as sent) and throws ApiError;
 * it never redirects or shows messages (the query cache and the pages decide that).
 * This module is in every page's first load: it must not import zod's runtime.
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
  const answer = await callApi(firstLoadAddresses.csrf);
  csrfToken = answer.token;
  return csrfToken;
}

/** Drops the token so the next write fetches a fresh one (it is bound to the session). */
export function forgetCsrfToken(): void {
  csrfToken = null;
}

export async function toApiError(response: Response): Promise<ApiError> {
  const error = errorBodyOf(await response.json().catch(() => null));
  if (error) return new ApiError(response.status, error.code, error.message, error.fields);
  return new ApiError(response.status, 'INTERNAL', 'Something went wrong on our side. Please try again.');
}

/** Reads a successful answer. */
type Reader = (response: Response) => Promise<unknown>;

/**
 * An endpoint's response schema parses its answer (an endpoint without one answers nothing); an Address, which
 * carries no schema, takes the JSON as sent.
 */
function readerOf(e: Address): Reader {
  if (!('access' in e)) return async (response) => (response.status === 204 ? undefined : response.json());
  const schema = (e as Endpoint).response;
  return schema ? async (response) => schema.parse(await response.json()) : async () => undefined;
}

async function readAnswer(response: Response, read: Reader): Promise<unknown> {
  if (!response.ok) throw await toApiError(response);
  return read(response);
}

/** A write; the token is fetched again once when the server says it went stale. */
async function write(method: WriteMethod, path: string, body: unknown, read: Reader): Promise<unknown> {
  let response = await send(method, path, body);
  if (response.status === 403) {
    const error = await toApiError(response.clone());
    // The token belongs to the session, so it goes stale on sign-in and sign-out: fetch a fresh one once.
    if (error.code === 'CSRF') {
      csrfToken = null;
      response = await send(method, path, body);
    }
  }
  return readAnswer(response, read);
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
 * Calls one endpoint of `shared/api/` (or its Address): its path filled from `params`, `query` appended, `body`
 * sent as JSON, and the answer parsed with the endpoint's response schema (undefined for empty answers).
 */
export function callApi<const A extends Address>(e: A, ...[input]: InputArgs<EndpointOf<A>>): Promise<Answer<EndpointOf<A>>> {
  const url = urlOf(e, input ?? {});
  const read = readerOf(e);
  const answer =
    e.method === 'get' ? send('GET', url).then((response) => readAnswer(response, read)) : write(e.method.toUpperCase() as WriteMethod, url, input?.body, read);
  return answer as Promise<Answer<EndpointOf<A>>>;
}

/**
 * The query key of an endpoint's answer: `['api', path template, params, query]`. A prefix of it names
 * a set to invalidate: every answer of the endpoint, or of one record (see cache-rules.ts).
 */
export function apiKey<A extends Address>(e: A, input: { params?: unknown; query?: unknown } = {}) {
  return ['api', e.path, input.params ?? {}, input.query ?? {}] as const;
}

/** TanStack Query options for a GET endpoint; spread them to add options (`{ ...apiQuery(e, input), staleTime }`). */
export function apiQuery<const A extends Address>(e: A, ...[input]: InputArgs<EndpointOf<A>>) {
  return queryOptions({
    queryKey: apiKey(e, input ?? {}),
    queryFn: () => callApi(e, ...([input] as InputArgs<EndpointOf<A>>)),
  });
}
