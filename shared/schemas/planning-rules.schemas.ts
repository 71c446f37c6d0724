import { z } from 'zod';
import { HARD_MAX_PROCESSING_MINUTES, limitedFamilyNames, type LimitedFamily } from '../rules/processing-limits';
import { MAX_LIFT_PER_SITTING } from '../quotes/lift-per-sitting';

const limit = (family: LimitedFamily) =>
  z
    .number({ error: 'Enter minutes' })
    .int('Enter whole minutes')
    .min(5, 'At least 5 minutes')
    .max(
      HARD_MAX_PROCESSING_MINUTES[family],
      `At most ${HARD_MAX_PROCESSING_MINUTES[family]} minutes for ${limitedFamilyNames[family].toLowerCase()} (the hard maximum)`,
    );

/** Minutes each limited family may stay on the hair in this salon, without heat (heat halves them). */
export const ProcessingLimitsSchema = z
  .object({
    lightener: limit('lightener'),
    oxidative_colour: limit('oxidative_colour'),
    toner_oxidative: limit('toner_oxidative'),
    colour_remover: limit('colour_remover'),
  })
  .strict();

const levels = z
  .number({ error: 'Enter levels' })
  .int('Enter whole levels')
  .min(1, 'At least 1 level')
  .max(MAX_LIFT_PER_SITTING, `At most ${MAX_LIFT_PER_SITTING} levels a sitting`);

/** Levels one sitting may lift, by the state of the hair; careful hair never lifts more than healthier hair. */
export const LiftPerSittingSchema = z
  .object({ virgin: levels, coloured: levels, compromised: levels })
  .strict()
  .refine((l) => l.coloured <= l.virgin, { message: 'Previously coloured hair cannot lift more than virgin hair', path: ['coloured'] })
  .refine((l) => l.compromised <= l.coloured, { message: 'Compromised hair cannot lift more than previously coloured hair', path: ['compromised'] });
