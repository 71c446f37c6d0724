import type { Db } from '@server/db/database';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { insertBooking } from '@server/features/bookings/bookings.repository';

/**
 * Oxidative colour in one sitting (so it needs a skin test): apply 20 min, develop 20–25 min, rinse 15 min. The
 * colour is on the hair 20 + 25 = 45 min at most, the default limit for oxidative colour (common practice).
 */
export const colourPlan: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'hands_on', label: 'Apply colour', product: 'oxidative_colour', minutes: 20 },
        { kind: 'developing', label: 'Colour develops', product: 'oxidative_colour', minMinutes: 20, maxMinutes: 25 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 15 },
      ],
    },
  ],
};

/**
 * A fixed-offset zone in which it is about midday now, so "today" and "minutes ago" stay on one salon date
 * whenever the tests run (IANA tz database: the Etc/GMT±n zones have the opposite sign of their UTC offset).
 */
export function middayZone(now = new Date()): string {
  const shift = 12 - now.getUTCHours();
  if (shift === 0) return 'UTC';
  return `Etc/GMT${shift > 0 ? '-' : '+'}${Math.abs(shift)}`;
}

let n = 0;

/**
 * A booked sitting (the colour plan unless another is given) whose first step was planned `minutesAgo` minutes before now (a multiple of 5; plus the
 * minutes since the last 5-minute mark), in a chair and basin of
 * its own (so the tests' bookings never collide), for the given stylist and client; straight into the book.
 */
export async function insertSittingAround(
  db: Db,
  input: { salonId: string; serviceId: string; stylistId: string; clientId: string; minutesAgo: number; depositCents?: number; plan?: StepPlan },
): Promise<string> {
  n++;
  const plan = input.plan ?? colourPlan;
  const [chair] = await db
    .insertInto('chairs')
    .values({ salon_id: input.salonId, name: `Day chair ${n}` })
    .returning('id')
    .execute();
  const [basin] = await db
    .insertInto('basins')
    .values({ salon_id: input.salonId, name: `Day basin ${n}` })
    .returning('id')
    .execute();
  // On the salon's 5-minute grid (as the engine plans, and reads the book): up to 4 minutes more than asked.
  const grid = 5 * 60_000;
  let at = Math.floor(Date.now() / grid) * grid - Math.round(input.minutesAgo / 5) * grid;
  // Each step at its planned minutes, developing at its most.
  const steps = plan.sittings[0]!.steps.map((s) => {
    const start = new Date(at);
    at += (s.kind === 'developing' ? s.maxMinutes : s.minutes) * 60_000;
    return { kind: s.kind, label: s.label, start, end: new Date(at), basinId: s.kind === 'basin' ? basin!.id : null };
  });
  return insertBooking(db, {
    salonId: input.salonId,
    clientId: input.clientId,
    serviceId: input.serviceId,
    stylistId: input.stylistId,
    status: 'booked',
    stepPlan: plan,
    priceCents: 12000,
    depositCents: input.depositCents ?? 3000,
    createdBy: null,
    sittings: [{ chairId: chair!.id, steps }],
  });
}
