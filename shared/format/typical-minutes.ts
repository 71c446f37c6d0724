import type { TypicalFigure } from '../schemas/typical-minutes.schemas';

/** Whole minutes a typical figure suggests, or null when it has no number (too few visits). */
export interface TypicalWholeMinutes {
  /** The median, rounded to the nearest minute: what "Use" puts in the plan. */
  typical: number;
  /** The 80th percentile rounded up, so "80% within" stays true; never below `typical`. */
  within: number;
}

// percentile_cont works in floating point (38 can arrive as 38.00000000000001); a hair over a whole minute is that minute.
const EPSILON = 1e-6;

export function typicalWholeMinutes(figure: TypicalFigure): TypicalWholeMinutes | null {
  if (figure.medianMinutes === null || figure.p80Minutes === null) return null;
  const typical = Math.round(figure.medianMinutes);
  return { typical, within: Math.max(typical, Math.ceil(figure.p80Minutes - EPSILON)) };
}

const visitsText = (n: number) => `${n} ${n === 1 ? 'visit' : 'visits'}`;

/** "typically 52 min (80% within 61) over 14 visits", or why there is no number. */
export function typicalMinutesText(figure: TypicalFigure, minVisits: number): string {
  const whole = typicalWholeMinutes(figure);
  if (whole) return `typically ${whole.typical} min (80% within ${whole.within}) over ${visitsText(figure.visits)}`;
  if (figure.visits === 0) return 'no finished visits yet';
  return `too few visits to say (${figure.visits} so far, ${minVisits} needed)`;
}
