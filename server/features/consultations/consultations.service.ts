import type { Db } from '../../db/database';
import type { SessionUser } from '../../../shared/schemas/auth.schemas';
import type { ConsultationInput, ConsultationView, CreateConsultation, ProposedQuoteView, QuoteEdit, QuoteWarning } from '../../../shared/schemas/consultation.schemas';
import type { ServiceSummary } from '../../../shared/schemas/service.schemas';
import { StepPlanSchema } from '../../../shared/schemas/step-plan.schemas';
import { proposeQuote } from '../../../shared/quotes/propose-quote';
import { AppError, notFound } from '../../lib/app-error';
import type { Mailer } from '../../mail/mailer';
import { quoteMail } from './quote-mail';
import { listStrandTests } from '../strand-tests/strand-tests.repository';
import { findClient } from '../clients/clients.repository';
import { listServices } from '../services/services.repository';
import {
  clientPhotoIds, findConsultation, insertConsultation, listClientConsultations, quotePriceInputs, setQuoteStatus, updateQuote, type ConsultationRow,
} from './consultations.repository';

const invalid = (field: string, message: string) => new AppError('VALIDATION_FAILED', 400, message, { [field]: message });

/** A quote books as one of the salon's colour services: the one whose plan has as many sittings as the proposal. */
function defaultService(services: ServiceSummary[], sittings: number): ServiceSummary | undefined {
  const colour = services.filter((s) => s.category === 'colour');
  const distance = (s: ServiceSummary) => Math.abs(s.stepPlan.sittings.length - sittings);
  return [...colour].sort((a, b) => distance(a) - distance(b) || b.priceCents - a.priceCents)[0];
}

async function bookableService(db: Db, salonId: string, serviceId: string, field: string): Promise<ServiceSummary> {
  const service = (await listServices(db, salonId)).find((s) => s.id === serviceId);
  if (!service) throw invalid(field, 'Pick one of the salon’s services.');
  return service;
}

/** The consultation's strand test, or else the latest one on the client's record (a quote must not warn about a test that was done). */
async function withRecordedStrandTest(db: Db, salonId: string, clientId: string | null | undefined, c: ConsultationInput): Promise<ConsultationInput> {
  if (c.strandTest !== 'none' || !clientId) return c;
  const [latest] = await listStrandTests(db, salonId, clientId);
  return latest ? { ...c, strandTest: latest.result } : c;
}

/** The proposal for a consultation at this salon's prices; the deposit follows the service's deposit. */
export async function proposeFor(db: Db, salonId: string, asked: ConsultationInput, serviceId: string | null, clientId?: string | null): Promise<ProposedQuoteView> {
  const consultation = await withRecordedStrandTest(db, salonId, clientId, asked);
  const prices = await quotePriceInputs(db, salonId);
  const draft = proposeQuote(consultation, { ...prices, deposit: { kind: 'fixed', cents: 0 } });
  const service = serviceId ? await bookableService(db, salonId, serviceId, 'serviceId') : defaultService(await listServices(db, salonId), draft.sittings);
  const quote = proposeQuote(consultation, { ...prices, deposit: { kind: 'fixed', cents: service?.depositCents ?? 0 } });
  return { ...quote, serviceId: service?.id ?? null, productGrams: quote.productGrams as Record<string, number> };
}

/** Warnings are the rules' judgement of the consultation, kept with the quote whatever the stylist edits. */
const warningsOf = (consultation: ConsultationInput, prices: Awaited<ReturnType<typeof quotePriceInputs>>): QuoteWarning[] =>
  proposeQuote(consultation, { ...prices, deposit: { kind: 'fixed', cents: 0 } }).warnings;

export async function createConsultation(db: Db, user: SessionUser, body: CreateConsultation): Promise<ConsultationView> {
  const client = await findClient(db, user.salonId, body.clientId);
  if (!client) throw invalid('clientId', 'Pick one of the salon’s clients.');
  await bookableService(db, user.salonId, body.quote.serviceId, 'quote.serviceId');
  const photos = await clientPhotoIds(db, client.id, body.photoIds);
  if (photos.length !== new Set(body.photoIds).size) throw invalid('photoIds', 'Link only this client’s own photos.');
  const warnings = warningsOf(await withRecordedStrandTest(db, user.salonId, client.id, body.consultation), await quotePriceInputs(db, user.salonId));
  const id = await db.transaction().execute((trx) =>
    insertConsultation(trx, { salonId: user.salonId, clientId: client.id, details: body.consultation, photoIds: photos, createdBy: user.id, quote: body.quote, warnings }),
  );
  return consultationView(db, user.salonId, id);
}

export async function editQuote(db: Db, user: SessionUser, id: string, edit: QuoteEdit): Promise<ConsultationView> {
  if (!(await findConsultation(db, user.salonId, id))) throw notFound('That consultation');
  await bookableService(db, user.salonId, edit.serviceId, 'serviceId');
  await updateQuote(db, id, edit);
  return consultationView(db, user.salonId, id);
}

/** E-mails the saved quote to the client and marks it sent; the client accepts it on their page. */
export async function sendQuote(db: Db, mailer: Mailer, user: SessionUser, id: string, acceptUrl: string, now: Date): Promise<ConsultationView> {
  const row = await findConsultation(db, user.salonId, id);
  if (!row) throw notFound('That consultation');
  if (!row.client_email) throw invalid('email', 'This client has no e-mail address; add one on the client card first.');
  const salon = await db.selectFrom('salons').select(['name', 'currency']).where('id', '=', user.salonId).executeTakeFirstOrThrow();
  await mailer.send(quoteMail(toView(row), row.client_email, salon, acceptUrl));
  await setQuoteStatus(db, row.quote_id, 'sent', now);
  return consultationView(db, user.salonId, id);
}

/** The signed-in client's sent and accepted quotes, newest first. */
export async function myQuotes(db: Db, salonId: string, clientId: string): Promise<ConsultationView[]> {
  return (await listClientConsultations(db, salonId, clientId)).filter((r) => r.status !== 'draft').map(toView);
}

/** The client accepts a quote that was sent to them (accepting twice answers the same). */
export async function acceptMyQuote(db: Db, salonId: string, clientId: string, quoteId: string, now: Date): Promise<ConsultationView> {
  const row = (await listClientConsultations(db, salonId, clientId)).find((r) => r.quote_id === quoteId && r.status !== 'draft');
  if (!row) throw notFound('That quote');
  if (row.status === 'sent') await setQuoteStatus(db, quoteId, 'accepted', now);
  return consultationView(db, salonId, row.id);
}

export async function consultationView(db: Db, salonId: string, id: string): Promise<ConsultationView> {
  const row = await findConsultation(db, salonId, id);
  if (!row) throw notFound('That consultation');
  return toView(row);
}

export async function clientConsultations(db: Db, salonId: string, clientId: string): Promise<ConsultationView[]> {
  if (!(await findClient(db, salonId, clientId))) throw notFound('That client');
  return (await listClientConsultations(db, salonId, clientId)).map(toView);
}

export function toView(r: ConsultationRow): ConsultationView {
  return {
    id: r.id,
    clientId: r.client_id,
    clientName: r.client_name,
    createdAt: r.created_at.toISOString(),
    createdByName: r.created_by_name,
    consultation: r.details as ConsultationInput,
    photoIds: r.photo_ids,
    quote: {
      id: r.quote_id, status: r.status, serviceId: r.service_id, serviceName: r.service_name, stepPlan: StepPlanSchema.parse(r.step_plan),
      priceCents: r.price_cents, depositCents: r.deposit_cents, notes: r.notes, warnings: r.warnings as QuoteWarning[],
      sentAt: r.sent_at?.toISOString() ?? null, acceptedAt: r.accepted_at?.toISOString() ?? null, bookingIds: r.booking_ids,
    },
  };
}
