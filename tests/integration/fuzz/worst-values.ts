import type { JsonSchema } from './schema-arbitrary';

/** One hostile value and a short name for it (printed when an answer breaks a property). */
export interface Worst {
  label: string;
  value: unknown;
}

// The patterns zod-to-openapi writes for LocalDateSchema and InstantInputSchema (shared/schemas/common.schemas.ts).
const isDate = (s: JsonSchema) => s.pattern === '^\\d{4}-\\d{2}-\\d{2}$';
const isInstant = (s: JsonSchema) => s.type === 'string' && (s.format === 'date-time' || Boolean(s.pattern?.startsWith('^\\d{4}-\\d{2}-\\d{2}T')));

/** Text PostgreSQL cannot store, text too long for any field or index, and text that breaks parsers. */
export const WORST_TEXT: Worst[] = [
  { label: 'NUL', value: 'a\u0000b' },
  { label: 'lone high surrogate', value: 'a\ud800b' },
  { label: 'lone low surrogate', value: '\udc00' },
  // Under the 100 kB JSON limit, so it reaches the schema (and, without a maximum, a btree index: 2,704 bytes at most).
  { label: '60 kB text', value: 'x'.repeat(60_000) },
];

/** One text of 1 MB: a body holding it is over every limit (413), a query or path holding it over Node's header limit. */
export const MEGABYTE_TEXT: Worst = { label: '1 MB text', value: 'y'.repeat(1024 * 1024) };

/** Calendar dates at and past the ends of what a date field accepts, and days that do not exist. */
export const WORST_DATES: Worst[] = [
  { label: 'year 9999', value: '9999-12-31' },
  { label: 'year 0', value: '0000-01-01' },
  { label: 'year 1', value: '0001-01-01' },
  { label: '30 February', value: '2027-02-30' },
];

export const WORST_INSTANTS: Worst[] = [
  { label: 'instant in year 9999', value: '9999-12-31T23:59:59.999Z' },
  { label: 'instant in year 0', value: '0000-01-01T00:00+14:00' },
  { label: 'instant at hour 24', value: '2027-03-14T24:00Z' },
];

/** Numbers past 32 and 53 bits, past double precision's range, fractions where whole numbers belong, and negatives. */
export const WORST_NUMBERS: Worst[] = [
  { label: '2^31', value: 2 ** 31 },
  { label: '-2^31 - 1', value: -(2 ** 31) - 1 },
  { label: '2^53 + 2', value: 2 ** 53 + 2 },
  { label: '1e308', value: 1e308 },
  { label: '0.5', value: 0.5 },
  { label: '-1', value: -1 },
];

export const WORST_IDS: Worst[] = [
  { label: 'nil uuid', value: '00000000-0000-0000-0000-000000000000' },
  { label: 'max uuid', value: 'ffffffff-ffff-ffff-ffff-ffffffffffff' },
  { label: 'not a uuid', value: 'not-a-uuid' },
];

/** A value of the wrong JSON type for a field of this schema. */
function wrongTypes(s: JsonSchema): Worst[] {
  const other = s.type === 'string' ? { label: 'a number', value: 12345 } : { label: 'a string', value: '12345' };
  return [other, { label: 'an object', value: { $gt: '' } }, { label: 'null', value: null }];
}

/** The worst values for one field, chosen by its type and format. */
export function worstFor(s: JsonSchema): Worst[] {
  const own: Worst[] = [];
  if (s.type === 'string') {
    own.push(...WORST_TEXT);
    if (isDate(s)) own.push(...WORST_DATES);
    else if (isInstant(s)) own.push(...WORST_INSTANTS);
    else if (s.format === 'uuid') own.push(...WORST_IDS);
  }
  if (s.type === 'integer' || s.type === 'number') own.push(...WORST_NUMBERS);
  if (s.type === 'array') own.push({ label: '5,000 items', value: Array.from({ length: 5000 }, () => 1) });
  return [...own, ...wrongTypes(s)];
}

/** A field the schema does not know, with names that have polluted prototypes before. */
export const UNKNOWN_FIELDS: Worst[] = [
  { label: 'unknown field', value: { zzUnknown: 1 } },
  { label: '__proto__ field', value: JSON.parse('{"__proto__": {"isAdmin": true}}') },
  { label: 'constructor field', value: { constructor: { prototype: { isAdmin: true } } } },
];

/** Whole JSON bodies of the wrong shape. */
export const WORST_BODIES: Worst[] = [
  { label: 'array body', value: [] },
  { label: 'string body', value: 'a\u0000b' },
  { label: 'number body', value: 1e308 },
  { label: 'null body', value: null },
];

/** Raw bodies that are not JSON at all, sent as application/json (and one as text). */
export const RAW_BODIES: { label: string; contentType: string; body: string | Buffer }[] = [
  { label: 'truncated JSON', contentType: 'application/json', body: '{"a": "' },
  { label: 'invalid UTF-8', contentType: 'application/json', body: Buffer.from([0x7b, 0x22, 0x61, 0x22, 0x3a, 0x22, 0xed, 0xa0, 0x80, 0x22, 0x7d]) },
  { label: 'UTF-16 charset', contentType: 'application/json; charset=utf-16', body: '{}' },
  { label: 'text/plain', contentType: 'text/plain', body: 'hello' },
  // Deep nesting inside the size limit: recursion in a parser or validator must not overflow the stack.
  { label: '20,000-deep JSON', contentType: 'application/json', body: '{"a":' + '['.repeat(20_000) + ']'.repeat(20_000) + '}' },
  { label: '1 MB JSON', contentType: 'application/json', body: JSON.stringify({ a: MEGABYTE_TEXT.value }) },
];

/** Hostile path and query text (as it arrives after %-decoding, or as a malformed %-escape a broken client sends). */
export const WORST_URL_TEXT: { label: string; encoded: string }[] = [
  { label: 'NUL', encoded: 'a%00b' },
  { label: 'lone surrogate (malformed escape)', encoded: '%ED%A0%80' },
  { label: 'bare %', encoded: '%' },
  { label: '8 kB text', encoded: 'z'.repeat(8_000) },
  { label: 'dot segments', encoded: '..%2F..%2Fetc%2Fpasswd' },
  { label: 'year 9999', encoded: '9999-12-31' },
  { label: '2^31', encoded: String(2 ** 31) },
  { label: '1e308', encoded: '1e308' },
];
