import type { Salon } from '@shared/schemas/salon.schemas';
import type { Cautions } from '@shared/schemas/online-booking.schemas';
import { planNeedsSkinTest } from '@shared/rules/skin-test-need';
import { cautionsFor } from './cautions';
import type { HoldRecord } from './holds.repository';

/** The cautions for a held time: the skin-test caution follows the booking's steps, like the rule itself. */
export function holdCautions(hold: HoldRecord, salon: Pick<Salon, 'skinTestLeadHours' | 'skinTestFamilies'>): Cautions {
  const needsSkinTest = planNeedsSkinTest(hold.stepPlan, salon.skinTestFamilies, hold.needsSkinTest);
  return cautionsFor({ category: hold.category, needsSkinTest }, salon.skinTestLeadHours);
}
