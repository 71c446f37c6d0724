/**
 * How many levels one sitting may lift, by the state of the hair. Pure. The salon may change the defaults
 * (Set-up → Salon) within the hard maximum; docs/quotes.md lists the same values.
 */
import type { ColourHistory, ConsultationInput } from '../schemas/consultation.schemas';

export const HAIR_STATES = ['virgin', 'coloured', 'compromised'] as const;
export type HairState = (typeof HAIR_STATES)[number];
export type LiftPerSitting = Record<HairState, number>;

/**
 * CP (from memory): about 3–4 levels a sitting on virgin, healthy hair (we take the lower end, 3); about 2 on
 * previously coloured or lightened hair; 1 on compromised hair (reduced or poor elasticity, high porosity).
 */
export const DEFAULT_LIFT_PER_SITTING: LiftPerSitting = { virgin: 3, coloured: 2, compromised: 1 };

/** CP: 4 levels is the top of the trade range for virgin, healthy hair; no hair lifts more in one sitting here. */
export const MAX_LIFT_PER_SITTING = 4;

export const hairStateNames: Record<HairState, string> = {
  virgin: 'virgin and healthy',
  coloured: 'previously coloured or lightened',
  compromised: 'compromised',
};

/** Artificial colour on the hair: anything but natural, untouched hair. */
export function previouslyColoured(h: ColourHistory): boolean {
  return h.permanent || h.directDye || h.boxDye || h.henna || h.previousLightening;
}

/** CP: reduced or poor elasticity, or high porosity, marks hair that breaks more easily under lightener. */
export function compromised(c: ConsultationInput): boolean {
  return c.elasticity !== 'good' || c.porosity === 'high';
}

/** The state that decides the lift: compromised before coloured before virgin (the most careful one applies). */
export function hairState(c: ConsultationInput): HairState {
  if (compromised(c)) return 'compromised';
  return previouslyColoured(c.history) ? 'coloured' : 'virgin';
}

/** Levels one sitting may lift: the salon's value for this hair, one fewer after a fragile strand test, never below 1 (CP). */
export function levelsPerSitting(c: ConsultationInput, lift: LiftPerSitting): number {
  const levels = lift[hairState(c)] - (c.strandTest === 'fragile' ? 1 : 0);
  return Math.max(1, levels);
}
