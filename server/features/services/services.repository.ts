import type { Db } from '@server/db/database';
import type { ServiceSummary } from '@shared/schemas/service.schemas';
import { StepPlanSchema } from '@shared/schemas/step-plan.schemas';

type Row = Awaited<ReturnType<typeof baseQuery>>[number];
const baseQuery = (db: Db, salonId: string) =>
  db
    .selectFrom('services')
    .select([
      'id',
      'name',
      'description',
      'category',
      'skill',
      'price_cents',
      'price_is_from',
      'deposit_cents',
      'deposit_percent',
      'online_bookable',
      'needs_skin_test',
      'step_plan',
    ])
    .where('salon_id', '=', salonId)
    .where('active', '=', true)
    .orderBy('name')
    .execute();

/** A percentage deposit is a share of the (list) price, rounded to the cent; otherwise the fixed amount. */
export const effectiveDeposit = (priceCents: number, fixedCents: number, percent: string | null): number =>
  percent === null ? fixedCents : Math.round((priceCents * Number(percent)) / 100);

/** A services row as the menu shows it (the deposit worked out from a percentage where set). */
export const toSummary = (r: Row): ServiceSummary => ({
  id: r.id,
  name: r.name,
  description: r.description,
  category: r.category,
  skill: r.skill,
  priceCents: r.price_cents,
  priceIsFrom: r.price_is_from,
  depositCents: effectiveDeposit(r.price_cents, r.deposit_cents, r.deposit_percent),
  onlineBookable: r.online_bookable,
  needsSkinTest: r.needs_skin_test,
  stepPlan: StepPlanSchema.parse(r.step_plan),
});

export async function listServices(db: Db, salonId: string): Promise<ServiceSummary[]> {
  return (await baseQuery(db, salonId)).map(toSummary);
}

export async function findService(db: Db, salonId: string, id: string): Promise<ServiceSummary | undefined> {
  return (await listServices(db, salonId)).find((s) => s.id === id);
}

export function listStylistDetails(db: Db, salonId: string) {
  return db
    .selectFrom('staff')
    .select(['id', 'display_name as name', 'skills', 'max_clients_at_once as maxClientsAtOnce'])
    .where('salon_id', '=', salonId)
    .where('active', '=', true)
    .orderBy('display_name')
    .execute();
}
