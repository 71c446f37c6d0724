import fc from 'fast-check';
import type { JsonSchema } from './schema-arbitrary';
import { idFor, type WalkIds } from './walk-ids';

/** A date two weeks ahead (a Wednesday, when the demo salon is open), so examples are bookable times. */
function exampleDate(): string {
  const d = new Date(Date.now() + 14 * 86_400_000);
  d.setUTCDate(d.getUTCDate() + ((3 - d.getUTCDay() + 7) % 7));
  return d.toISOString().slice(0, 10);
}

/**
 * One valid-looking value for a schema, the same on every run: the baseline a walk replaces one field of at a
 * time, so the other fields pass and the hostile one is what the server meets. Ids are the walk's real records.
 * `all` fills optional fields too (every field a walk visits); without it only required ones (the baseline,
 * since optional fields often tie records together in ways an example cannot know).
 */
export function exampleFor(s: JsonSchema, ids: WalkIds, name = '', all = true): unknown {
  const alternatives = s.oneOf ?? s.anyOf;
  if (alternatives?.[0]) return exampleFor(alternatives[0], ids, name, all);
  if (s.allOf?.length) return exampleFor(Object.assign({}, ...s.allOf), ids, name, all);
  if (s.enum?.length) return s.enum[0];
  switch (s.type) {
    case 'string':
      return exampleString(s, ids, name);
    case 'integer':
    case 'number':
      return Math.max(s.minimum ?? 1, Math.min(s.maximum ?? 1, 1));
    case 'boolean':
      return false;
    case 'array': {
      const item = exampleFor(s.items ?? {}, ids, name, all);
      return Array.from({ length: Math.max(1, s.minItems ?? 0) }, () => item);
    }
    case 'object':
      return Object.fromEntries(
        Object.entries(s.properties ?? {})
          .filter(([k]) => all || s.required?.includes(k))
          .map(([k, v]) => [k, exampleFor(v, ids, k, all)]),
      );
    default:
      return 'x';
  }
}

// Text fields whose rules a pattern does not tell, by name: what a person would type.
const BY_NAME: [RegExp, string][] = [
  [/email/i, 'walk@example.test'],
  [/phone|^from$/i, '+19705550142'],
  [/rrule/i, 'FREQ=WEEKLY;BYDAY=WE'],
  [/timeZone/, 'America/Denver'],
  [/currency/, 'USD'],
  [/country/, 'US'],
];
const TIME_OF_DAY = /^\^\(\[01\]|^\^\\d\{2\}:/;

function exampleString(s: JsonSchema, ids: WalkIds, name: string): string {
  if (s.format === 'uuid') return idFor(ids, name) ?? '00000000-0000-4000-8000-000000000000';
  if (s.pattern === '^\\d{4}-\\d{2}-\\d{2}$') return /birth/i.test(name) ? '1990-05-17' : exampleDate();
  if (s.format === 'date-time' || s.pattern?.startsWith('^\\d{4}-\\d{2}-\\d{2}T')) return `${exampleDate()}T17:00:00.000Z`;
  if (s.pattern && TIME_OF_DAY.test(s.pattern)) return /^(to|end|until)/i.test(name) ? '17:00' : '09:00';
  if (name === 'slug' || name === 'salonSlug') return ids.slug;
  const known = !s.pattern && BY_NAME.find(([re]) => re.test(name));
  if (known) return known[1];
  if (s.pattern) {
    const [drawn] = fc.sample(fc.stringMatching(new RegExp(s.pattern)), { seed: 18, numRuns: 1 });
    return drawn ?? '';
  }
  const text = 'Walk example text';
  return text.slice(0, s.maxLength ?? text.length).padEnd(s.minLength ?? 0, 'x');
}
