/** One changed value of an audit entry, as dotted path and its before/after values. */
export type Change = { field: string; before: unknown; after: unknown };

type Flat = Map<string, unknown>;

function flatten(value: unknown, prefix: string, into: Flat): Flat {
  if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    for (const [key, inner] of Object.entries(value)) flatten(inner, prefix ? `${prefix}.${key}` : key, into);
  } else if (Array.isArray(value) && value.some((v) => v !== null && typeof v === 'object')) {
    value.forEach((inner, i) => flatten(inner, `${prefix}.${i + 1}`, into));
  } else if (prefix) {
    into.set(prefix, value);
  }
  return into;
}

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** What an audit entry changed: only fields whose value differs between before and after, in a stable order. */
export function describeChange(before: unknown, after: unknown): Change[] {
  const was = flatten(before, '', new Map());
  const now = flatten(after, '', new Map());
  const fields = [...new Set([...was.keys(), ...now.keys()])];
  return fields.filter((f) => !same(was.get(f), now.get(f))).map((field) => ({ field, before: was.get(field), after: now.get(field) }));
}

const capitalise = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/** "sittings.2.startTime" → "Sitting 2 start time": camelCase split, a numbered list item named in the singular. */
export function fieldLabel(field: string): string {
  const words = field
    .split('.')
    .map((part) => part.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase())
    .join(' ')
    .replace(/\b(\w+)s (\d+)\b/g, '$1 $2');
  return capitalise(words);
}

/** "moved_sitting" or "moved sitting 2" → "Moved sitting 2". */
export function actionLabel(action: string): string {
  return capitalise(action.replace(/_/g, ' '));
}

const INSTANT = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}/;

/** A value for a person to read: times in the salon zone, empty as a dash. */
export function valueText(value: unknown, formatInstant: (iso: string) => string): string {
  if (value === undefined || value === null || value === '') return '—';
  if (typeof value === 'string') return INSTANT.test(value) ? formatInstant(value) : value;
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (Array.isArray(value)) return value.map((v) => valueText(v, formatInstant)).join(', ');
  return String(value);
}
