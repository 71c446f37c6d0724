import { IdParamsSchema } from '../../../shared/schemas/common.schemas';
import {
  ConsultationListSchema, ConsultationViewSchema, CreateConsultationSchema, ProposeQuoteRequestSchema, ProposedQuoteSchema, QuoteEditSchema,
} from '../../../shared/schemas/consultation.schemas';
import type { AppDeps } from '../../app-deps';
import { STAFF } from '../../auth/require-access';
import { apiRoute } from '../../lib/api-route';
import { myClientId } from '../../auth/client-access';
import { acceptMyQuote, clientConsultations, consultationView, createConsultation, editQuote, myQuotes, proposeFor, sendQuote } from './consultations.service';

// Stylists, desk and owner record consultations and edit quotes; the desk books them (bookings.quoteId).
export function registerConsultationRoutes({ table, db, mailer, config }: AppDeps): void {
  apiRoute(
    table,
    { method: 'post', path: '/api/consultations/propose', access: STAFF, summary: 'The quote Dwell proposes for a consultation; nothing is stored', body: ProposeQuoteRequestSchema, response: ProposedQuoteSchema },
    ({ user, body }) => proposeFor(db, user.salonId, body.consultation, body.serviceId, body.clientId),
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/consultations', access: STAFF, summary: 'Record a consultation with its (edited) quote', body: CreateConsultationSchema, response: ConsultationViewSchema, status: 201 },
    ({ user, body }) => createConsultation(db, user, body),
  );
  apiRoute(
    table,
    { method: 'get', path: '/api/consultations/:id', access: STAFF, summary: 'One consultation and its quote', params: IdParamsSchema, response: ConsultationViewSchema },
    ({ user, params }) => consultationView(db, user.salonId, params.id),
  );
  apiRoute(
    table,
    { method: 'put', path: '/api/consultations/:id/quote', access: STAFF, summary: 'Save an edited quote (back to draft if it was sent)', params: IdParamsSchema, body: QuoteEditSchema, response: ConsultationViewSchema },
    ({ user, params, body }) => editQuote(db, user, params.id, body),
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/consultations/:id/quote/send', access: STAFF, summary: 'E-mail the quote to the client (status sent)', params: IdParamsSchema, response: ConsultationViewSchema },
    ({ user, params, req }) => sendQuote(db, mailer, user, params.id, `${config.publicUrl ?? `${req.protocol}://${req.get('host')}`}/me`, new Date()),
  );
  apiRoute(
    table,
    { method: 'get', path: '/api/me/quotes', access: ['client'], summary: "The signed-in client's quotes sent to them", response: ConsultationListSchema },
    async ({ user }) => ({ consultations: await myQuotes(db, user.salonId, await myClientId(db, user)) }),
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/me/quotes/:id/accept', access: ['client'], summary: 'The signed-in client accepts a quote sent to them', params: IdParamsSchema, response: ConsultationViewSchema },
    async ({ user, params }) => acceptMyQuote(db, user.salonId, await myClientId(db, user), params.id, new Date()),
  );
  apiRoute(
    table,
    { method: 'get', path: '/api/clients/:id/consultations', access: STAFF, summary: "A client's consultations and quotes, newest first", params: IdParamsSchema, response: ConsultationListSchema },
    async ({ user, params }) => ({ consultations: await clientConsultations(db, user.salonId, params.id) }),
  );
}
