import type { DocumentedRoute, Method } from '../access-matrix/openapi-routes';
import type { JsonSchema } from './schema-arbitrary';
import { exampleFor } from './example-value';
import { idFor, type WalkIds } from './walk-ids';
import { malformedMultipart } from './malformed-multipart';
import {
  MEGABYTE_TEXT,
  RAW_BODIES,
  UNKNOWN_FIELDS,
  WORST_BODIES,
  WORST_DATES,
  WORST_INSTANTS,
  WORST_NUMBERS,
  WORST_TEXT,
  WORST_URL_TEXT,
  worstFor,
  type Worst,
} from './worst-values';

/** One request of a walk, ready to send: the path with its query string, and the raw body. */
export interface WalkCase {
  label: string;
  method: Method;
  path: string;
  contentType?: string;
  body?: string | Buffer;
}

type Path = (string | number)[];
const NO_RECORD = '00000000-0000-4000-8000-000000000000';
interface Node {
  path: Path;
  schema: JsonSchema;
}

/**
 * Every worst value for every field of one route, each sent with the rest of the request valid (the route's own
 * example, with the walk's real ids): each path parameter and query value in turn, each field of the JSON body at
 * any depth, then every field of one type at once, unknown fields, wrong bodies, bodies that are not JSON, and
 * for uploads malformed multipart. Deterministic, so a failure names the exact request.
 */
export function routeWalk(route: DocumentedRoute, ids: WalkIds): WalkCase[] {
  const params = route.operation.parameters ?? [];
  const pathParams = params.filter((p) => p.in === 'path');
  const queryParams = params.filter((p) => p.in === 'query');
  const content = route.operation.requestBody?.content ?? {};
  const jsonSchema = content['application/json']?.schema as JsonSchema | undefined;
  const formSchema = content['application/x-www-form-urlencoded']?.schema as JsonSchema | undefined;

  const segments = route.path.split('/');
  const literalBefore = (name: string) =>
    segments
      .slice(0, segments.indexOf(`{${name}}`))
      .filter((s) => !s.startsWith('{'))
      .pop();
  const pathValues = Object.fromEntries(
    pathParams.map((p) => [p.name, String(idFor(ids, p.name, literalBefore(p.name)) ?? exampleFor(p.schema as JsonSchema, ids, p.name))]),
  );
  const query = Object.fromEntries(queryParams.map((p) => [p.name, String(exampleFor(p.schema as JsonSchema, ids, p.name))]));
  // The baseline holds the required fields; the walk visits every field, optional ones filled in as they are reached.
  const body = jsonSchema ? exampleFor(jsonSchema, ids, '', false) : undefined;
  const full = jsonSchema ? exampleFor(jsonSchema, ids) : undefined;
  const setAt = (value: unknown, path: Path, replacement: unknown) => replaceAt(value, path, replacement, full);

  const url = (values: Record<string, string>, q: [string, string][]) => {
    const path = route.path.replace(/\{(\w+)\}/g, (_m, name: string) => values[name] ?? 'x');
    return q.length ? `${path}?${q.map(([k, v]) => `${k}=${v}`).join('&')}` : path;
  };
  const encodedPath = Object.fromEntries(Object.entries(pathValues).map(([k, v]) => [k, encodeURIComponent(v)]));
  const encodedQuery = Object.entries(query).map(([k, v]): [string, string] => [k, encodeURIComponent(v)]);
  const base = url(encodedPath, encodedQuery);
  const cases: WalkCase[] = [];
  const json = (label: string, value: unknown, path = base): WalkCase => ({
    label,
    method: route.method,
    path,
    contentType: 'application/json',
    body: value === undefined ? undefined : JSON.stringify(value),
  });
  const plain = (label: string, path: string): WalkCase => (jsonSchema ? json(label, body, path) : { label, method: route.method, path });

  for (const p of pathParams) {
    for (const w of WORST_URL_TEXT) cases.push(plain(`path {${p.name}} = ${w.label}`, url({ ...encodedPath, [p.name]: w.encoded }, encodedQuery)));
  }
  for (const p of queryParams) {
    const others = encodedQuery.filter(([k]) => k !== p.name);
    for (const w of WORST_URL_TEXT) cases.push(plain(`query ${p.name} = ${w.label}`, url(encodedPath, [...others, [p.name, w.encoded]])));
    cases.push(plain(`query ${p.name} repeated`, url(encodedPath, [...encodedQuery, [p.name, 'again']])));
    cases.push(plain(`query ${p.name}[] as a list`, url(encodedPath, [...others, [`${p.name}[]`, 'a'], [`${p.name}[x]`, 'b']])));
  }
  // Every route, with inputs or none, meets query keys it does not know.
  cases.push(plain('unknown query key', url(encodedPath, [...encodedQuery, ['zzUnknown', '1']])));
  cases.push(plain('unknown query key holding NUL', url(encodedPath, [...encodedQuery, ['zz%00Unknown', 'a%00b']])));

  if (jsonSchema) {
    const nodes = nodesOf(jsonSchema, full);
    for (const node of nodes) {
      for (const w of worstFor(node.schema)) cases.push(json(`body ${node.path.join('.')} = ${w.label}`, setAt(body, node.path, w.value)));
    }
    // Every field of one kind at once: the worst a form can send when all its dates or all its numbers are wrong.
    const allAt = (label: string, pick: (s: JsonSchema) => boolean, w: Worst) => {
      const chosen = nodes.filter((n) => pick(n.schema));
      if (chosen.length > 1)
        cases.push(
          json(
            `body every ${label} = ${w.label}`,
            chosen.reduce((b, n) => setAt(b, n.path, w.value), body),
          ),
        );
    };
    const isDate = (s: JsonSchema) => s.pattern === '^\\d{4}-\\d{2}-\\d{2}$';
    const isInstant = (s: JsonSchema) => Boolean(s.pattern?.startsWith('^\\d{4}-\\d{2}-\\d{2}T'));
    for (const w of WORST_DATES.slice(0, 3)) allAt('date', isDate, w);
    for (const w of WORST_INSTANTS.slice(0, 2)) allAt('instant', isInstant, w);
    for (const w of WORST_NUMBERS.slice(0, 4)) allAt('number', (s) => s.type === 'integer' || s.type === 'number', w);
    for (const w of WORST_TEXT.slice(0, 2)) allAt('text', (s) => s.type === 'string' && !s.enum, w);
    const firstText = nodes.find((n) => n.schema.type === 'string');
    if (firstText) cases.push(json(`body ${firstText.path.join('.')} = ${MEGABYTE_TEXT.label}`, setAt(body, firstText.path, MEGABYTE_TEXT.value)));
    if (isObject(body)) for (const w of UNKNOWN_FIELDS) cases.push(json(`body with ${w.label}`, { ...(w.value as object), ...body }));
  }
  if (jsonSchema || route.method !== 'get') {
    // A route without a body ignores one, and would act on its real ids (delete, deactivate): those go to no record.
    const target = jsonSchema ? base : url(Object.fromEntries(pathParams.map((p) => [p.name, NO_RECORD])), encodedQuery);
    for (const w of WORST_BODIES) cases.push(json(`whole body = ${w.label}`, w.value, target));
    for (const r of RAW_BODIES) cases.push({ label: `body is ${r.label}`, method: route.method, path: target, contentType: r.contentType, body: r.body });
  }
  if (formSchema) {
    for (const name of Object.keys(formSchema.properties ?? {})) {
      for (const w of WORST_URL_TEXT) {
        cases.push({
          label: `form ${name} = ${w.label}`,
          method: route.method,
          path: base,
          contentType: 'application/x-www-form-urlencoded',
          body: `${name}=${w.encoded}`,
        });
      }
    }
  }
  if (content['multipart/form-data']) {
    for (const m of malformedMultipart())
      cases.push({ label: `multipart: ${m.label}`, method: route.method, path: base, contentType: m.contentType, body: m.body });
  }
  return cases;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** Every field below the root of an example value, with its schema (an array's first item stands for all). */
function nodesOf(schema: JsonSchema, value: unknown, path: Path = []): Node[] {
  const s = schema.oneOf?.[0] ?? schema.anyOf?.[0] ?? schema;
  const own: Node[] = path.length ? [{ path, schema: s }] : [];
  if (s.type === 'object' && isObject(value)) {
    return [...own, ...Object.entries(s.properties ?? {}).flatMap(([k, v]) => (k in value ? nodesOf(v, value[k], [...path, k]) : []))];
  }
  if (s.type === 'array' && Array.isArray(value) && value.length) return [...own, ...nodesOf(s.items ?? {}, value[0], [...path, 0])];
  return own;
}

/** A copy of `value` with the field at `path` replaced; fields missing on the way are taken from `template`. */
function replaceAt(value: unknown, path: Path, replacement: unknown, template: unknown): unknown {
  const [head, ...rest] = path;
  if (head === undefined) return replacement;
  const within = (v: unknown) => (Array.isArray(v) || isObject(v) ? (v as Record<string | number, unknown>)[head] : undefined);
  const inner = (v: unknown) => replaceAt(within(v) ?? within(template), rest, replacement, within(template));
  if (Array.isArray(value)) return value.map((v, i) => (i === head ? replaceAt(v, rest, replacement, within(template)) : v));
  if (isObject(value)) return { ...value, [head]: inner(value) };
  return value;
}
