/**
 * Whether a step plan needs a skin test, from what its steps put on the hair. Oxidative hair dyes (permanent and
 * demi-permanent colour mixed with developer, oxidative toners) carry the para-dyes behind most allergic
 * reactions, and their EU label warns that they "can cause severe allergic reactions" (Regulation (EC) No
 * 1223/2009, Annex III, oxidative hair-dye entries): they always need one, whatever service they are booked
 * under. A salon may widen the rule to other families (many test before lightener too, common practice), never
 * narrow it.
 */
import type { ProductFamily, StepPlan } from '../schemas/step-plan.schemas';

/** The families that always need a skin test. */
export const ALWAYS_TESTED: readonly ProductFamily[] = ['oxidative_colour', 'toner_oxidative'];

/** Families a salon may add to the rule. */
export const WIDENING_FAMILIES = ['lightener', 'colour_remover', 'direct_dye', 'toner_direct', 'bond_care'] as const satisfies readonly ProductFamily[];
export type WideningFamily = (typeof WIDENING_FAMILIES)[number];

/** What each family is, in the words staff and clients read. */
export const productFamilyLabels: Record<ProductFamily, string> = {
  oxidative_colour: 'Oxidative colour (permanent or demi-permanent, with developer)',
  toner_oxidative: 'Toner with developer (oxidative)',
  lightener: 'Lightener (bleach)',
  colour_remover: 'Colour remover',
  direct_dye: 'Direct dye (no developer)',
  toner_direct: 'Toner without developer',
  bond_care: 'Bond or care treatment',
  none: 'Nothing (cut, blow-dry, rinse, talk)',
};

/** The same in a word or two, for narrow pickers (the step editor). */
export const productFamilyShortLabels: Record<ProductFamily, string> = {
  oxidative_colour: 'Oxidative colour',
  toner_oxidative: 'Toner, with developer',
  lightener: 'Lightener',
  colour_remover: 'Colour remover',
  direct_dye: 'Direct dye',
  toner_direct: 'Toner, no developer',
  bond_care: 'Bond or care',
  none: 'Nothing',
};

/** The families that need a skin test in this salon. */
export function testedFamilies(widening: readonly ProductFamily[]): Set<ProductFamily> {
  return new Set([...ALWAYS_TESTED, ...widening]);
}

/** The first step that needs a skin test, as "sitting n, step k: label (family)", or null when none does. */
export function stepNeedingSkinTest(
  plan: StepPlan,
  widening: readonly ProductFamily[],
): { sitting: number; step: number; label: string; product: ProductFamily } | null {
  const tested = testedFamilies(widening);
  for (const [i, sitting] of plan.sittings.entries()) {
    for (const [k, step] of sitting.steps.entries()) {
      if (tested.has(step.product)) return { sitting: i + 1, step: k + 1, label: step.label, product: step.product };
    }
  }
  return null;
}

/**
 * Whether a booking of this plan needs a skin test: by its steps, or because the service asks for one as well
 * (a service's own box can only add to the rule).
 */
export function planNeedsSkinTest(plan: StepPlan, widening: readonly ProductFamily[], serviceAsks = false): boolean {
  return serviceAsks || stepNeedingSkinTest(plan, widening) !== null;
}
