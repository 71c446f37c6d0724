import type { ZodError } from 'zod';

/** `{ "sittings.0.steps.1.minutes": "Too small…" }`: the first message per field path. */
export function fieldMessages(err: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of err.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_';
    if (issue.code === 'unrecognized_keys') {
      for (const k of issue.keys) fields[[...issue.path, k].join('.')] ??= 'This field is not allowed.';
      continue;
    }
    fields[key] ??= issue.message;
  }
  return fields;
}
