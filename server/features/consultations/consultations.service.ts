import type { z } from 'zod';
import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type {
  ConsultationInput,
  ConsultationView,
  DepositPolicy,
  CreateConsultation,
  ProposeQuoteRequestSchema,
  ProposedQuoteView,
  QuoteEdit,
  QuoteWarning,
  StrandOutcome,
} from '@shared/schemas/consultation.schemas';
import type { ServiceSummary } from '@shared/schemas/service.schemas';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { proposeQuote, type PlanningRules, type ProposedQuote, type QuotePricing } from '@shared/quotes/propose-quote';
import { ProposalRefused } from '@shared/quotes/stage-steps';
import { gatedSteps, strandOutcome, strandOverrideProblem } from '@shared/quotes/strand-gate';
import { AppError, notFound } from '@server/lib/app-error';
import type { Mailer } from '@server/mail/mailer';
import { quoteMail } from './quote-mail';
import { listStrandTests } from '../strand-tests';
import { findClient } from '../clients';
import { listServices } from '../services';
import { findSalon } from '../salon';
import { writeAudit } from '../audit';
import { assertWithinProcessingLimits } from '../planning';
import { myClientId } from '@server/auth/client-access';
import {
  clientPhotoIds,
  findConsultation,
  insertConsultation,
  listClientConsultations,
  quotePriceInputs,
  setQuoteStatus,
  updateQuote,
  type StoredConsultation,
} from './consultations.repository';

const invalid = (field: string, message: string) => new AppError('VALIDATION_FAILED', 400, message, { [field]: message });

/** A service fits a quote when its plan has at least the quote's sittings: its deposit holds a booking that long. */
const fits = (service: ServiceSummary, sittings: number) => service.stepPlan.sittings.length >= sittings;

/**
 * A quote books as one of the salon's colour services: the nearest that fits (the one whose plan has as many
 * sittings as the proposal, else the fewest more; the dearer of two), or when none on the menu has that many
 * sittings, the one with the most.
 */
function defaultService(services: ServiceSummary[], sittings: number): ServiceSummary | undefined {
  const colour = services.filter((s) => s.category === 'colour');
  const distance = (s: ServiceSummary) => Math.abs(s.stepPlan.sittings.length - sittings);
  const misfit = (s: ServiceSummary) => (fits(s, sittings) ? 0 : 1);
  return [...colour].sort((a, b) => misfit(a) - misfit(b) || distance(a) - distance(b) || b.priceCents - a.priceCents)[0];
}

/**
 * The deposit a quote carries: its service's own when the service fits; for a longer job than the service's, the
 * same share of the quote's price (a two-sitting service's deposit does not hold five sittings).
 */
function depositPolicy(service: ServiceSummary | undefined, sittings: number): DepositPolicy {
  if (!service) return { kind: 'fixed', cents: 0 };
  if (fits(service, sittings) || service.priceCents === 0) return { kind: 'fixed', cents: service.depositCents };
  return { kind: 'percent', percent: Math.min(100, (service.depositCents / service.priceCents) * 100) };
}

/** Said on a proposal filed under a service with fewer sittings, so the stylist can pick another or edit the deposit. */
function misfitWarning(service: ServiceSummary | undefined, sittings: number): QuoteWarning[] {
  if (!service || fits(service, sittings)) return [];
  const share = Math.round((service.depositCents / Math.max(1, service.priceCents)) * 100);
  const planned = service.stepPlan.sittings.length;
  return [
    {
      code: 'no_fitting_service',
      message: `No colour service on the menu has ${sittings} sittings: the quote books as “${service.name}” (${planned} ${planned === 1 ? 'sitting' : 'sittings'}) with its own ${sittings} sittings, and its deposit is that service’s share of the price (${share} %).`,
    },
  ];
}

async function bookableService(db: Db, salonId: string, serviceId: string, field: string): Promise<ServiceSummary> {
  const service = (await listServices(db, salonId)).find((s) => s.id === serviceId);
  if (!service) throw invalid(field, 'Pick one of the salon’s services.');
  return service;
}

/** The client's latest recorded strand test result, if any. */
async function latestStrandResult(db: Db, salonId: string, clientId: string | null | undefined) {
  if (!clientId) return null;
  const [latest] = await listStrandTests(db, salonId, clientId);
  return latest?.result ?? null;
}

/**
 * The consultation as the rules read it: its strand-test answer, or the client's latest recorded test when that
 * asks for more care (a quote must not warn about a test that was done, nor overlook one that failed).
 */
async function withRecordedStrandTest(db: Db, salonId: string, clientId: string | null | undefined, c: ConsultationInput): Promise<ConsultationInput> {
  return { ...c, strandTest: strandOutcome(c.strandTest, await latestStrandResult(db, salonId, clientId)) };
}

/** The salon's prices and planning rules, as the quote rules take them. */
async function quoteInputs(db: Db, salonId: string): Promise<{ prices: Omit<QuotePricing, 'deposit'>; rules: PlanningRules }> {
  const [prices, salon] = await Promise.all([quotePriceInputs(db, salonId), findSalon(db, salonId)]);
  return { prices, rules: { processingLimits: salon.processingLimits, liftPerSitting: salon.liftPerSitting } };
}

/** The rules' proposal, or 409 with the reason when a stage cannot be planned within the salon's processing limits. */
function proposeOrRefuse(c: ConsultationInput, pricing: QuotePricing, rules: PlanningRules): ProposedQuote {
  try {
    return proposeQuote(c, pricing, rules);
  } catch (e) {
    if (e instanceof ProposalRefused) throw new AppError('CONFLICT', 409, e.message);
    throw e;
  }
}

/** The proposal for a consultation at this salon's prices; the deposit follows the service's deposit (depositPolicy). */
export async function proposeFor(db: Db, user: SessionUser, request: z.output<typeof ProposeQuoteRequestSchema>): Promise<ProposedQuoteView> {
  const { consultation: asked, serviceId, clientId } = request;
  const { salonId } = user;
  const consultation = await withRecordedStrandTest(db, salonId, clientId, asked);
  const { prices, rules } = await quoteInputs(db, salonId);
  const draft = proposeOrRefuse(consultation, { ...prices, deposit: { kind: 'fixed', cents: 0 } }, rules);
  const service = serviceId ? await bookableService(db, salonId, serviceId, 'serviceId') : defaultService(await listServices(db, salonId), draft.sittings);
  const quote = proposeOrRefuse(consultation, { ...prices, deposit: depositPolicy(service, draft.sittings) }, rules);
  return {
    ...quote,
    warnings: [...quote.warnings, ...misfitWarning(service, quote.sittings)],
    serviceId: service?.id ?? null,
    strandTest: consultation.strandTest,
    productGrams: quote.productGrams as Record<string, number>,
  };
}

/** Warnings are the rules' judgement of the consultation, kept with the quote whatever the stylist edits. */
async function warningsOf(db: Db, salonId: string, consultation: ConsultationInput): Promise<QuoteWarning[]> {
  const { prices, rules } = await quoteInputs(db, salonId);
  try {
    return proposeQuote(consultation, { ...prices, deposit: { kind: 'fixed', cents: 0 } }, rules).warnings;
  } catch (e) {
    // The stylist planned by hand what the rules could not fit: keep why with the quote.
    if (e instanceof ProposalRefused) return [{ code: 'processing_limit', message: e.message }];
    throw e;
  }
}

/**
 * A quote's plan is held to the salon's processing limits, and after a failed strand test it may plan lightener
 * or colour remover only with a written reason (409 STRAND_TEST naming the reason field).
 */
function assertQuoteAllowed(plan: StepPlan, limits: PlanningRules['processingLimits'], outcome: StrandOutcome, reason: string, prefix: string): void {
  assertWithinProcessingLimits(plan, limits, prefix || undefined);
  const problem = strandOverrideProblem(plan, outcome, reason);
  if (problem) throw new AppError('STRAND_TEST', 409, problem, { [`${prefix ? `${prefix}.` : ''}overrideReason`]: problem });
}

/** An override of a failed strand test is a safety decision: it goes to the audit log with its reason. */
async function auditOverride(db: Db, user: SessionUser, quoteId: string, plan: StepPlan, outcome: StrandOutcome, reason: string): Promise<void> {
  const steps = gatedSteps(plan);
  if (outcome !== 'failed' || steps.length === 0) return;
  await writeAudit(db, {
    salonId: user.salonId,
    actorUserId: user.id,
    entity: 'quote',
    entityId: quoteId,
    action: 'lightening planned after a failed strand test',
    after: { reason, steps },
  });
}

export async function createConsultation(db: Db, user: SessionUser, body: CreateConsultation): Promise<ConsultationView> {
  const client = await findClient(db, user.salonId, body.clientId);
  if (!client) throw invalid('clientId', 'Pick one of the salon’s clients.');
  await bookableService(db, user.salonId, body.quote.serviceId, 'quote.serviceId');
  const photos = await clientPhotoIds(db, client.id, body.photoIds);
  if (photos.length !== new Set(body.photoIds).size) throw invalid('photoIds', 'Link only this client’s own photos.');
  const consultation = await withRecordedStrandTest(db, user.salonId, client.id, body.consultation);
  const salon = await findSalon(db, user.salonId);
  assertQuoteAllowed(body.quote.stepPlan, salon.processingLimits, consultation.strandTest, body.quote.overrideReason, 'quote');
  const warnings = await warningsOf(db, user.salonId, consultation);
  const id = await db.transaction().execute(async (trx) => {
    const created = await insertConsultation(trx, {
      salonId: user.salonId,
      clientId: client.id,
      details: body.consultation,
      photoIds: photos,
      createdBy: user.id,
      quote: body.quote,
      warnings,
    });
    const view = await consultationView(trx, user.salonId, created);
    await auditOverride(trx, user, view.quote.id, body.quote.stepPlan, consultation.strandTest, body.quote.overrideReason);
    return created;
  });
  return consultationView(db, user.salonId, id);
}

export async function editQuote(db: Db, user: SessionUser, id: string, edit: QuoteEdit): Promise<ConsultationView> {
  const row = await findConsultation(db, user.salonId, id);
  if (!row) throw notFound('That consultation');
  await bookableService(db, user.salonId, edit.serviceId, 'serviceId');
  const outcome = strandOutcome(row.consultation.strandTest, await latestStrandResult(db, user.salonId, row.clientId));
  assertQuoteAllowed(edit.stepPlan, (await findSalon(db, user.salonId)).processingLimits, outcome, edit.overrideReason, '');
  await db.transaction().execute(async (trx) => {
    await updateQuote(trx, id, edit);
    await auditOverride(trx, user, row.quote.id, edit.stepPlan, outcome, edit.overrideReason);
  });
  return consultationView(db, user.salonId, id);
}

/** E-mails the saved quote to the client and marks it sent; the client accepts it on their page. */
export async function sendQuote(db: Db, mailer: Mailer, user: SessionUser, id: string, acceptUrl: string, now: Date): Promise<ConsultationView> {
  const row = await findConsultation(db, user.salonId, id);
  if (!row) throw notFound('That consultation');
  if (!row.clientEmail) throw invalid('email', 'This client has no e-mail address; add one on the client card first.');
  const salon = await findSalon(db, user.salonId);
  await mailer.send(quoteMail(toView(row, null), row.clientEmail, salon, acceptUrl));
  await setQuoteStatus(db, row.quote.id, 'sent', now);
  return consultationView(db, user.salonId, id);
}

/** The signed-in client's sent and accepted quotes, newest first. */
export async function myQuotes(db: Db, user: SessionUser): Promise<{ consultations: ConsultationView[] }> {
  const clientId = await myClientId(db, user);
  const latest = await latestStrandResult(db, user.salonId, clientId);
  return { consultations: (await listClientConsultations(db, user.salonId, clientId)).filter((c) => c.quote.status !== 'draft').map((c) => toView(c, latest)) };
}

/** The signed-in client accepts a quote that was sent to them (accepting twice answers the same). */
export async function acceptMyQuote(db: Db, user: SessionUser, quoteId: string, now: Date): Promise<ConsultationView> {
  const clientId = await myClientId(db, user);
  const row = (await listClientConsultations(db, user.salonId, clientId)).find((c) => c.quote.id === quoteId && c.quote.status !== 'draft');
  if (!row) throw notFound('That quote');
  if (row.quote.status === 'sent') await setQuoteStatus(db, quoteId, 'accepted', now);
  return consultationView(db, user.salonId, row.id);
}

/** One consultation of the user's salon. */
export async function oneConsultation(db: Db, user: SessionUser, id: string): Promise<ConsultationView> {
  return consultationView(db, user.salonId, id);
}

async function consultationView(db: Db, salonId: string, id: string): Promise<ConsultationView> {
  const row = await findConsultation(db, salonId, id);
  if (!row) throw notFound('That consultation');
  return toView(row, await latestStrandResult(db, salonId, row.clientId));
}

export async function clientConsultations(db: Db, user: SessionUser, clientId: string): Promise<{ consultations: ConsultationView[] }> {
  if (!(await findClient(db, user.salonId, clientId))) throw notFound('That client');
  const latest = await latestStrandResult(db, user.salonId, clientId);
  return { consultations: (await listClientConsultations(db, user.salonId, clientId)).map((c) => toView(c, latest)) };
}

/** A stored consultation and quote; `latestRecorded` is the client's latest strand test, which the quote is held to. */
function toView(stored: StoredConsultation, latestRecorded: Awaited<ReturnType<typeof latestStrandResult>>): ConsultationView {
  const { clientEmail, consultation, ...rest } = stored;
  return { ...rest, consultation, strandTest: strandOutcome(consultation.strandTest, latestRecorded) };
}
