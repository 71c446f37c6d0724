import type { Db } from '@server/db/database';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';

let seq = 0;

/**
 * A two-sitting correction: 2 h 20 min then 1 h 30 min, 1–7 days apart (needs a skin test). The lightener is on
 * the hair 20 + 30 = 50 min, within the default processing limit (50 min, counted from the first application).
 */
export const correctionPlan: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'hands_on', label: 'Apply lightener', product: 'lightener', minutes: 20 },
        { kind: 'developing', label: 'Lightener lifts', product: 'lightener', minMinutes: 30, maxMinutes: 30 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 15 },
        { kind: 'hands_on', label: 'Tone and dry', product: 'toner_direct', minutes: 75 },
      ],
    },
    {
      daysAfterPrevious: { min: 1, max: 7 },
      steps: [
        { kind: 'hands_on', label: 'Apply colour', product: 'direct_dye', minutes: 30 },
        { kind: 'developing', label: 'Colour develops', product: 'direct_dye', minMinutes: 30, maxMinutes: 40 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 15 },
        { kind: 'hands_on', label: 'Cut and finish', product: 'none', minutes: 15 },
      ],
    },
  ],
};

/** A short window fit: apply, develop 10–20 min, rinse. */
export const tonerPlan: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'hands_on', label: 'Apply toner', product: 'toner_direct', minutes: 10 },
        { kind: 'developing', label: 'Toner develops', product: 'toner_direct', minMinutes: 10, maxMinutes: 20 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 10 },
      ],
    },
  ],
};

export async function insertPlannedService(
  db: Db,
  salonId: string,
  overrides: {
    plan?: StepPlan;
    needsSkinTest?: boolean;
    skill?: string;
    category?: 'colour' | 'cut' | 'skin_test' | 'treatment';
    depositCents?: number;
    name?: string;
  } = {},
): Promise<string> {
  seq++;
  const row = await db
    .insertInto('services')
    .values({
      salon_id: salonId,
      name: overrides.name ?? `Planned service ${seq}`,
      category: overrides.category ?? 'colour',
      skill: overrides.skill ?? 'colour',
      price_cents: 20000,
      deposit_cents: overrides.depositCents ?? 5000,
      needs_skin_test: overrides.needsSkinTest ?? false,
      step_plan: JSON.stringify(overrides.plan ?? correctionPlan),
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

/** A negative skin test applied `daysAgo` days before now. */
export async function insertNegativeSkinTest(db: Db, salonId: string, clientId: string, daysAgo = 10): Promise<void> {
  const appliedAt = new Date(Date.now() - daysAgo * 86_400_000);
  await db
    .insertInto('skin_tests')
    .values({
      salon_id: salonId,
      client_id: clientId,
      applied_at: appliedAt,
      read_at: new Date(appliedAt.getTime() + 48 * 3_600_000),
      result: 'negative',
      recorded_by: null,
    })
    .execute();
}
