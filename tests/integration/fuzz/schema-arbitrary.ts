import fc from 'fast-check';

/** The part of OpenAPI 3.0's schema object that zod-to-openapi writes for Dwell's zod schemas. */
export interface JsonSchema {
  type?: 'string' | 'integer' | 'number' | 'boolean' | 'array' | 'object';
  format?: string;
  enum?: unknown[];
  pattern?: string;
  minLength?: number;
  maxLength?: number;
  minimum?: number;
  maximum?: number;
  items?: JsonSchema;
  minItems?: number;
  maxItems?: number;
  properties?: Record<string, JsonSchema>;
  required?: string[];
  oneOf?: JsonSchema[];
  anyOf?: JsonSchema[];
  allOf?: JsonSchema[];
  nullable?: boolean;
}

/** Text that has broken web apps before: markup, NUL, lone surrogates, right-to-left marks, huge numbers. */
export const hostileText = fc.constantFrom(
  '<script>alert(1)</script>',
  '"><img src=x onerror=alert(1)>',
  'a\u0000b',
  '\ud800',
  '\u202eevil',
  '../../etc/passwd',
  "' or 1=1 --",
  '=HYPERLINK("http://x")',
  '9'.repeat(400),
  '1e309',
  '-0',
  'NaN',
  '%00',
  '{"$gt":""}',
  ' ',
  '',
);

export interface ArbitraryOptions {
  /** Real ids of the test's data, so some requests reach past the "not found" checks. */
  ids: string[];
}

/** Mostly valid values for a schema (the shape the API asks for), now and then hostile ones. */
export function arbitraryFor(schema: JsonSchema, opts: ArbitraryOptions, depth = 0): fc.Arbitrary<unknown> {
  const valid = validFor(schema, opts, depth);
  const withNull = schema.nullable ? fc.option(valid, { nil: null, freq: 4 }) : valid;
  return fc.oneof({ arbitrary: withNull, weight: 8 }, { arbitrary: hostileValue, weight: 1 });
}

function validFor(s: JsonSchema, opts: ArbitraryOptions, depth: number): fc.Arbitrary<unknown> {
  const alternatives = s.oneOf ?? s.anyOf;
  if (alternatives?.length) return fc.oneof(...alternatives.map((a) => arbitraryFor(a, opts, depth + 1)));
  if (s.allOf?.length) return arbitraryFor(Object.assign({}, ...s.allOf), opts, depth + 1);
  if (s.enum?.length) return fc.constantFrom(...s.enum);
  switch (s.type) {
    case 'string':
      return stringFor(s, opts);
    case 'integer':
      return fc.integer({ min: s.minimum ?? -1_000_000, max: s.maximum ?? 1_000_000 });
    case 'number':
      return fc.double({ min: s.minimum ?? -1e6, max: s.maximum ?? 1e6, noNaN: true, noDefaultInfinity: true });
    case 'boolean':
      return fc.boolean();
    case 'array': {
      const min = s.minItems ?? 0;
      const max = Math.max(min, Math.min(s.maxItems ?? 3, depth > 2 ? min : 3));
      return fc.array(arbitraryFor(s.items ?? {}, opts, depth + 1), { minLength: min, maxLength: max });
    }
    case 'object': {
      const props = Object.fromEntries(Object.entries(s.properties ?? {}).map(([k, v]) => [k, arbitraryFor(v, opts, depth + 1)]));
      return fc.record(props, { requiredKeys: (s.required ?? []).filter((k) => k in props) });
    }
    default:
      return fc.jsonValue({ maxDepth: 2 });
  }
}

function stringFor(s: JsonSchema, opts: ArbitraryOptions): fc.Arbitrary<string> {
  if (s.format === 'uuid') return opts.ids.length ? fc.oneof(fc.constantFrom(...opts.ids), fc.uuid()) : fc.uuid();
  if (s.format === 'date-time') return fc.date({ min: new Date('2020-01-01'), max: new Date('2030-12-31'), noInvalidDate: true }).map((d) => d.toISOString());
  if (s.format === 'date')
    return fc.date({ min: new Date('2020-01-01'), max: new Date('2030-12-31'), noInvalidDate: true }).map((d) => d.toISOString().slice(0, 10));
  if (s.format === 'email') return fc.emailAddress();
  if (s.pattern) return fc.stringMatching(new RegExp(s.pattern)).filter((v) => v.length <= (s.maxLength ?? 200));
  return fc.string({ minLength: s.minLength ?? 0, maxLength: Math.min(s.maxLength ?? 40, 60), unit: 'grapheme' });
}

/** Any JSON at all, or hostile text: what a broken or malicious client may send instead of the field. */
export const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  hostileText,
  fc.jsonValue({ maxDepth: 2 }),
  fc.constantFrom(Number.MAX_SAFE_INTEGER, -1, 0, 1.5, 1e300, true, [], {}, null),
);
