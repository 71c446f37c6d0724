/** The one error the engine throws for bad input: it always names the offending field. */
import type { z } from 'zod';

export class ScenarioError extends Error {
  /** Path of the field, e.g. "bookings[3].steps[1].start". */
  readonly field: string;
  constructor(field: string, problem: string) {
    super(`${field || 'scenario'}: ${problem}`);
    this.name = 'ScenarioError';
    this.field = field || 'scenario';
  }
}

/** Renders a zod path as a.b[2].c. */
export function fieldPath(path: ReadonlyArray<PropertyKey>): string {
  return path.reduce<string>((acc, key) => {
    if (typeof key === 'number') return `${acc}[${key}]`;
    return acc ? `${acc}.${String(key)}` : String(key);
  }, '');
}

/** The first zod issue as a ScenarioError (one clear message beats a list of follow-on errors). */
export function fromZodError(error: z.ZodError): ScenarioError {
  const [issue] = error.issues;
  // A failed parse always carries at least one issue.
  if (!issue) return new ScenarioError('', error.message);
  return new ScenarioError(fieldPath(issue.path), issue.message);
}
