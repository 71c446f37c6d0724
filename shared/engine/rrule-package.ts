import * as rrulePackage from 'rrule';

/**
 * The rrule package, whichever way it was loaded. Vite and Vitest resolve its ES build; plain Node
 * (`npm start` through tsx) resolves its CommonJS build, whose exports sit on `default`.
 */
export const rrule = ((rrulePackage as { RRule?: unknown }).RRule
  ? rrulePackage
  : (rrulePackage as unknown as { default: typeof rrulePackage }).default) as typeof rrulePackage;
