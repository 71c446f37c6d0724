import * as rrulePackage from 'rrule';

type RrulePackage = typeof rrulePackage;

/**
 * The rrule package, whichever way it was loaded. Vite and Vitest resolve its ES build, whose names sit on the
 * namespace; plain Node (`npm start` through tsx) resolves its CommonJS build, whose names sit on `default`.
 * `default` is read with Reflect.get because the bundler sees only the ES build and would warn that it has none.
 */
export const rrule: RrulePackage = 'RRule' in rrulePackage ? rrulePackage : (Reflect.get(rrulePackage, 'default') as RrulePackage);
