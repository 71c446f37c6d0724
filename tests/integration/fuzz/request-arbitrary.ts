import fc from 'fast-check';
import type { DocumentedRoute } from '../access-matrix/openapi-routes';
import { arbitraryFor, hostileText, hostileValue, type ArbitraryOptions, type JsonSchema } from './schema-arbitrary';

export interface FuzzRequest {
  path: string;
  query: Record<string, string | string[]>;
  body: unknown;
}

/**
 * Requests for one route: values drawn from its OpenAPI schema (params, query, JSON body), then sometimes
 * mutated the way a hostile client would: a field dropped, retyped or added, the whole body replaced,
 * a path parameter or query value swapped for hostile text, a query key repeated.
 */
export function requestArbitrary(route: DocumentedRoute, opts: ArbitraryOptions & { slug: string }): fc.Arbitrary<FuzzRequest> {
  const params = route.operation.parameters ?? [];
  const pathParams = params.filter((p) => p.in === 'path');
  const queryParams = params.filter((p) => p.in === 'query');
  const bodySchema = route.operation.requestBody?.content['application/json']?.schema as JsonSchema | undefined;

  const pathValues = fc.record(
    Object.fromEntries(
      pathParams.map((p) => [
        p.name,
        p.name === 'slug'
          ? fc.oneof(fc.constant(opts.slug), hostileText, fc.string())
          : fc.oneof(arbitraryFor(p.schema as JsonSchema, opts).map(asText), hostileText),
      ]),
    ),
  );
  const query = fc.record(
    Object.fromEntries(queryParams.map((p) => [p.name, arbitraryFor(p.schema as JsonSchema, opts).map((v) => (Array.isArray(v) ? v.map(asText) : asText(v)))])),
    { requiredKeys: queryParams.filter((p) => p.required).map((p) => p.name) },
  );
  const body = bodySchema ? arbitraryFor(bodySchema, opts) : fc.constant(undefined);

  const valid = fc.record({ pathValues, query, body });
  return fc.tuple(valid, mutation).map(([req, mutate]) => {
    const out = { path: fillParams(route.path, req.pathValues as Record<string, string>), query: req.query as FuzzRequest['query'], body: req.body };
    return mutate(out);
  });
}

type Mutate = (r: FuzzRequest) => FuzzRequest;

const mutation: fc.Arbitrary<Mutate> = fc.oneof(
  { weight: 4, arbitrary: fc.constant<Mutate>((r) => r) },
  fc.record({ key: fc.string({ maxLength: 12 }), value: hostileValue }).map(({ key, value }): Mutate => (r) => ({ ...r, body: setKey(r.body, key, value) })),
  fc.nat().map((n): Mutate => (r) => ({ ...r, body: dropKey(r.body, n) })),
  fc.nat().chain((n) => hostileValue.map((value): Mutate => (r) => ({ ...r, body: replaceKey(r.body, n, value) }))),
  hostileValue.map((value): Mutate => (r) => ({ ...r, body: value })),
  fc
    .record({ key: fc.constantFrom('date', 'from', 'q', 'serviceId', 'limit', 'x'), value: fc.array(hostileText, { minLength: 1, maxLength: 3 }) })
    .map(({ key, value }): Mutate => (r) => ({ ...r, query: { ...r.query, [key]: value.length === 1 ? value[0]! : value } })),
);

function fillParams(path: string, values: Record<string, string>) {
  return path.replace(/\{(\w+)\}/g, (_m, name: string) => encodeSegment(values[name] ?? 'x'));
}

/** A lone surrogate cannot be percent-encoded; it goes as the malformed escape a broken client would send. */
function encodeSegment(value: string): string {
  try {
    return encodeURIComponent(value);
  } catch {
    return '%ED%A0%80';
  }
}

// A path segment or query value is text; an object drawn for a loosely typed parameter (fast-check may make it without a
// prototype, which String() cannot convert) is sent as its JSON.
const asText = (v: unknown): string => (typeof v === 'object' && v !== null ? JSON.stringify(v) : String(v));
const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

function setKey(body: unknown, key: string, value: unknown) {
  return isObject(body) ? { ...body, [key]: value } : body;
}

function dropKey(body: unknown, n: number) {
  if (!isObject(body)) return body;
  const keys = Object.keys(body);
  if (!keys.length) return body;
  const { [keys[n % keys.length]!]: _gone, ...rest } = body;
  return rest;
}

function replaceKey(body: unknown, n: number, value: unknown) {
  if (!isObject(body)) return body;
  const keys = Object.keys(body);
  return keys.length ? { ...body, [keys[n % keys.length]!]: value } : body;
}
