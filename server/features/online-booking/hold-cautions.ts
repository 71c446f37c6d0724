import type { Salon } from '../../../shared/schemas/salon.schemas';
import type { StepPlan } from '../../../shared/schemas/step-plan.schemas';
import type { Cautions } from '../../../shared/schemas/online-booking.schemas';
import { planNeedsSkinTest } from '../../../shared/rules/skin-test-need';
import { cautionsFor } from './cautions';
import type { HoldRow } from './holds.repository';

/** The cautions for a held time: the skin-test caution follows the booking's steps, like the rule itself. */
export function holdCautions(hold: HoldRow, salon: Pick<Salon, 'skinTestLeadHours' | 'skinTestFamilies'>): Cautions {
  const needsSkinTest = planNeedsSkinTest(hold.step_plan as StepPlan, salon.skinTestFamilies, hold.needs_skin_test);
  return cautionsFor({ category: hold.category, needsSkinTest }, salon.skinTestLeadHours);
}
