import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import type { TestApp } from '../setup/test-app';
import { insertSalon } from './salon';
import { insertUser } from './user';
import { insertPlannedService } from './service';
import { messageDesk } from './messages';

/** A 30-minute gloss, one hands-on step. */
export const glossRefreshPlan: StepPlan = { sittings: [{ steps: [{ kind: 'hands_on', label: 'Gloss', product: 'toner_direct', minutes: 30 }] }] };

/**
 * A salon of its own for the desk's money tests: no quiet hours (texts go at once), a stylist, a "Gloss refresh" whose
 * deposit is $65.00 (ISO 4217 USD, 2 decimals: 6500 cents), and a signed-in desk that books it.
 */
export async function depositDesk(t: TestApp) {
  const db = t.testDb.db;
  const salon = await insertSalon(db);
  await db.updateTable('salons').set({ quiet_from: '00:00', quiet_to: '00:00' }).where('id', '=', salon.salonId).execute();
  const ana = await insertUser(db, salon.salonId, 'stylist');
  const serviceId = await insertPlannedService(db, salon.salonId, { plan: glossRefreshPlan, name: 'Gloss refresh', category: 'treatment', depositCents: 6500 });
  const desk = await messageDesk(t, salon.salonId, ana.staffId!);
  return { salon, ana, serviceId, desk };
}
