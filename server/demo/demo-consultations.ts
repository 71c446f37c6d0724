// The demo salon's consultation work: product costs, one strand test and one quote sent to the demo client,
// proposed by the quote rules at the demo salon's prices and planning rules (nothing hard-coded).
// Invented values for the invented salon.
import { DateTime } from 'luxon';
import type { Db } from '../db/database';
import type { ConsultationInput } from '@shared/schemas/consultation.schemas';
import { proposeQuote } from '@shared/quotes/propose-quote';
import { quotePriceInputs } from '../features/consultations/consultations.repository';
import { findSalon } from '../features/salon/salon.repository';
import { demoServices, type ServiceKey } from './demo-catalogue';

// Cents per gram of each product as weighed into the bowl, developer apart (demo values, not market prices).
const demoProductCosts = { lightener: 4, remover: 6, permanent: 8, demi_permanent: 7, direct_dye: 5, toner: 7, bond_builder: 30, developer: 1.5 } as const;

const jordan: ConsultationInput = {
  currentLevel: 4,
  targetLevel: 8,
  history: { natural: false, permanent: true, directDye: false, boxDye: true, henna: false, previousLightening: false },
  length: 'long',
  density: 'medium',
  elasticity: 'good',
  porosity: 'normal',
  conditionNotes: 'Box dye over permanent on the lengths; roots natural level 5. Ends a little dry.',
  strandTest: 'none',
  wantsCut: true,
  vivid: true,
  notes: 'Wants a copper-rose vivid over a level 8 base, and a long layered cut.',
};

export async function insertDemoConsultations(
  db: Db,
  ids: { salonId: string; clients: string[]; services: Record<ServiceKey, string> },
  now: Date,
): Promise<void> {
  await db
    .insertInto('product_costs')
    .values(
      Object.entries(demoProductCosts).map(([product_type, cents_per_gram]) => ({
        salon_id: ids.salonId,
        product_type: product_type as keyof typeof demoProductCosts,
        cents_per_gram,
      })),
    )
    .execute();
  const ana = await db.selectFrom('users').select('id').where('salon_id', '=', ids.salonId).where('email', '=', 'ana@demo.test').executeTakeFirstOrThrow();
  const clientId = ids.clients[0]!; // the demo client account, always inserted first
  const at = DateTime.fromJSDate(now).minus({ days: 3 }).set({ hour: 11, minute: 0, second: 0, millisecond: 0 }).toJSDate();
  await db
    .insertInto('strand_tests')
    .values({
      salon_id: ids.salonId,
      client_id: clientId,
      tested_at: at,
      tested: 'Colour remover on a nape strand, then lightener 1:2',
      product_type: 'remover',
      developer_percent: null,
      minutes: 25,
      result: 'passed',
      notes: 'Remover took the box dye to a warm 6; lightener lifted to 7 with the strand still strong.',
      recorded_by: ana.id,
    })
    .execute();
  const salon = await findSalon(db, ids.salonId);
  const quote = proposeQuote(
    { ...jordan, strandTest: 'passed' },
    { ...(await quotePriceInputs(db, ids.salonId)), deposit: { kind: 'fixed', cents: demoServices.correction.depositCents ?? 0 } },
    { processingLimits: salon.processingLimits, liftPerSitting: salon.liftPerSitting },
  );
  const { id } = await db
    .insertInto('consultations')
    .values({ salon_id: ids.salonId, client_id: clientId, details: JSON.stringify(jordan), created_by: ana.id, created_at: at })
    .returning('id')
    .executeTakeFirstOrThrow();
  await db
    .insertInto('quotes')
    .values({
      salon_id: ids.salonId,
      consultation_id: id,
      client_id: clientId,
      service_id: ids.services.correction,
      step_plan: JSON.stringify(quote.stepPlan),
      price_cents: quote.priceCents,
      deposit_cents: quote.depositCents,
      notes:
        'Two sittings a few days apart to protect the lengths; bond builder in every lightener bowl; the vivid shade goes on in sections at the second sitting.',
      warnings: JSON.stringify(quote.warnings),
      status: 'sent',
      sent_at: at,
    })
    .execute();
}
