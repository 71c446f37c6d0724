import type { Db } from '@server/db/database';
import { insertBooking, type NewStep } from '@server/features/bookings/bookings.repository';

let seq = 0;

const at = (iso: string) => new Date(iso);

/** A service row good enough to book against. */
export async function insertService(db: Db, salonId: string): Promise<string> {
  seq++;
  const plan = { sittings: [{ steps: [{ kind: 'hands_on', label: 'Apply', product: 'none', minutes: 30 }] }] };
  const row = await db
    .insertInto('services')
    .values({ salon_id: salonId, name: `Service ${seq}`, category: 'colour', skill: 'colour', price_cents: 5000, step_plan: JSON.stringify(plan) })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

export interface BookingInput {
  salonId: string;
  clientId: string;
  stylistId: string;
  chairId: string;
  serviceId: string;
  /** Steps as [kind, startIso, endIso, basinId?]. */
  steps: [NewStep['kind'], string, string, string?][];
}

/** One booking with one sitting, its steps given exactly; goes through the app's own repository. */
export function insertTestBooking(db: Db, input: BookingInput): Promise<string> {
  return insertBooking(db, {
    salonId: input.salonId,
    clientId: input.clientId,
    serviceId: input.serviceId,
    stylistId: input.stylistId,
    status: 'booked',
    stepPlan: { sittings: [{ steps: [{ kind: 'hands_on', label: 'Apply', product: 'none', minutes: 30 }] }] },
    priceCents: 5000,
    depositCents: 0,
    createdBy: null,
    sittings: [
      {
        chairId: input.chairId,
        steps: input.steps.map(([kind, start, end, basin]) => ({ kind, label: kind, start: at(start), end: at(end), basinId: basin ?? null })),
      },
    ],
  });
}
