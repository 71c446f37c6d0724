import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { ConsultationInput, ConsultationView, QuoteEdit, QuoteWarning } from '@shared/schemas/consultation.schemas';
import { StepPlanSchema } from '@shared/schemas/step-plan.schemas';
import { correctionRate, productCentsPerGram } from '../quote-prices';

/** What a quote is priced from: the salon's hourly rate, its cut price, its cost per gram per product type and its currency. */
export async function quotePriceInputs(db: Db, salonId: string) {
  const [correctionCentsPerHour, cut, costs, salon] = await Promise.all([
    correctionRate(db, salonId),
    // The salon's main cut service: the dearest active one of category cut.
    db
      .selectFrom('services')
      .select('price_cents')
      .where('salon_id', '=', salonId)
      .where('category', '=', 'cut')
      .where('active', '=', true)
      .orderBy('price_cents', 'desc')
      .executeTakeFirst(),
    productCentsPerGram(db, salonId),
    db.selectFrom('salons').select('currency').where('id', '=', salonId).executeTakeFirstOrThrow(),
  ]);
  return { correctionCentsPerHour, cutFinishCents: cut?.price_cents ?? 0, productCentsPerGram: costs, currency: salon.currency };
}

/** The client's photos among these ids (the others are not theirs, or do not exist). */
export async function clientPhotoIds(db: Db, clientId: string, ids: string[]): Promise<string[]> {
  if (ids.length === 0) return [];
  const rows = await db.selectFrom('client_photos').select('id').where('client_id', '=', clientId).where('id', 'in', ids).execute();
  return rows.map((r) => r.id);
}

export async function insertConsultation(
  db: Db,
  c: { salonId: string; clientId: string; details: ConsultationInput; photoIds: string[]; createdBy: string; quote: QuoteEdit; warnings: QuoteWarning[] },
): Promise<string> {
  const { id } = await db
    .insertInto('consultations')
    .values({ salon_id: c.salonId, client_id: c.clientId, details: JSON.stringify(c.details), created_by: c.createdBy })
    .returning('id')
    .executeTakeFirstOrThrow();
  if (c.photoIds.length)
    await db
      .insertInto('consultation_photos')
      .values(c.photoIds.map((photo_id) => ({ consultation_id: id, photo_id })))
      .execute();
  await db
    .insertInto('quotes')
    .values({
      salon_id: c.salonId,
      consultation_id: id,
      client_id: c.clientId,
      service_id: c.quote.serviceId,
      step_plan: JSON.stringify(c.quote.stepPlan),
      price_cents: c.quote.priceCents,
      deposit_cents: c.quote.depositCents,
      notes: c.quote.notes,
      warnings: JSON.stringify(c.warnings),
      override_reason: c.quote.overrideReason,
    })
    .execute();
  return id;
}

/** Saves the stylist's edit; a quote already sent or accepted goes back to draft, since the client saw another one. */
export function updateQuote(db: Db, consultationId: string, q: QuoteEdit) {
  return db
    .updateTable('quotes')
    .set({
      service_id: q.serviceId,
      step_plan: JSON.stringify(q.stepPlan),
      price_cents: q.priceCents,
      deposit_cents: q.depositCents,
      notes: q.notes,
      override_reason: q.overrideReason,
      status: 'draft',
      sent_at: null,
      accepted_at: null,
      updated_at: new Date(),
    })
    .where('consultation_id', '=', consultationId)
    .execute();
}

export function setQuoteStatus(db: Db, quoteId: string, status: 'sent' | 'accepted', at: Date) {
  return db
    .updateTable('quotes')
    .set(status === 'sent' ? { status, sent_at: at } : { status, accepted_at: at })
    .where('id', '=', quoteId)
    .execute();
}

const consultationQuery = (db: Db, salonId: string) =>
  db
    .selectFrom('consultations as c')
    .innerJoin('quotes as q', 'q.consultation_id', 'c.id')
    .innerJoin('clients as cl', 'cl.id', 'c.client_id')
    .innerJoin('services as s', 's.id', 'q.service_id')
    .leftJoin('users as u', 'u.id', 'c.created_by')
    .select([
      'c.id',
      'c.client_id',
      'cl.name as client_name',
      'cl.email as client_email',
      'c.details',
      'c.created_at',
      'u.name as created_by_name',
      'q.id as quote_id',
      'q.status',
      'q.service_id',
      's.name as service_name',
      'q.step_plan',
      'q.price_cents',
      'q.deposit_cents',
      'q.notes',
      'q.warnings',
      'q.override_reason',
      'q.sent_at',
      'q.accepted_at',
    ])
    .select((eb) => [
      eb.fn
        .coalesce(
          eb
            .selectFrom('consultation_photos as cp')
            .innerJoin('client_photos as p', 'p.id', 'cp.photo_id')
            .select(sql<string[]>`array_agg(cp.photo_id order by p.created_at)`.as('ids'))
            .whereRef('cp.consultation_id', '=', 'c.id'),
          sql<string[]>`'{}'::uuid[]`,
        )
        .as('photo_ids'),
      eb.fn
        .coalesce(
          eb
            .selectFrom('bookings as b')
            .select(sql<string[]>`array_agg(b.id order by b.created_at)`.as('ids'))
            .whereRef('b.quote_id', '=', 'q.id')
            .where('b.status', '!=', 'cancelled'),
          sql<string[]>`'{}'::uuid[]`,
        )
        .as('booking_ids'),
    ])
    .where('c.salon_id', '=', salonId);

type ConsultationRow = Awaited<ReturnType<ReturnType<typeof consultationQuery>['executeTakeFirstOrThrow']>>;

/**
 * A stored consultation and its quote, and where the quote is e-mailed. The strand test the quote is held to
 * is not stored: it follows the client's latest record (the service decides it).
 */
export type StoredConsultation = Omit<ConsultationView, 'strandTest'> & { clientEmail: string | null };

function toStored(r: ConsultationRow): StoredConsultation {
  const details = r.details as ConsultationInput;
  return {
    id: r.id,
    clientId: r.client_id,
    clientName: r.client_name,
    clientEmail: r.client_email,
    createdAt: r.created_at.toISOString(),
    createdByName: r.created_by_name,
    // Records kept before the vivid question was asked did not want one.
    consultation: { ...details, vivid: details.vivid ?? false },
    photoIds: r.photo_ids,
    quote: {
      id: r.quote_id,
      status: r.status,
      serviceId: r.service_id,
      serviceName: r.service_name,
      stepPlan: StepPlanSchema.parse(r.step_plan),
      priceCents: r.price_cents,
      depositCents: r.deposit_cents,
      notes: r.notes,
      overrideReason: r.override_reason,
      warnings: r.warnings as QuoteWarning[],
      sentAt: r.sent_at?.toISOString() ?? null,
      acceptedAt: r.accepted_at?.toISOString() ?? null,
      bookingIds: r.booking_ids,
    },
  };
}

export async function findConsultation(db: Db, salonId: string, id: string): Promise<StoredConsultation | undefined> {
  const row = await consultationQuery(db, salonId).where('c.id', '=', id).executeTakeFirst();
  return row && toStored(row);
}

/** A client's consultations, newest first. */
export async function listClientConsultations(db: Db, salonId: string, clientId: string): Promise<StoredConsultation[]> {
  return (await consultationQuery(db, salonId).where('c.client_id', '=', clientId).orderBy('c.created_at', 'desc').execute()).map(toStored);
}

/** A quote of this salon and client, for booking it. */
export function findClientQuote(db: Db, salonId: string, clientId: string, quoteId: string) {
  return db
    .selectFrom('quotes')
    .select(['id', 'price_cents', 'deposit_cents', 'service_id'])
    .where('id', '=', quoteId)
    .where('salon_id', '=', salonId)
    .where('client_id', '=', clientId)
    .executeTakeFirst();
}
