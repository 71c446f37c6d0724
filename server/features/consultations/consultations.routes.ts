import { IdParamsSchema } from '../../../shared/schemas/common.schemas';
import {
  ConsultationListSchema, ConsultationViewSchema, CreateConsultationSchema, ProposeQuoteRequestSchema, ProposedQuoteSchema, QuoteEditSchema,
} from '../../../shared/schemas/consultation.schemas';
import type { AppDeps } from '../../app-deps';
import { STAFF } from '../../auth/require-access';
import { apiRoute } from '../../lib/api-route';
import { clientConsultations, consultationView, createConsultation, editQuote, proposeFor } from './consultations.service';

// Stylists, desk and owner record consultations and edit quotes; the desk books them (bookings.quoteId).
export function registerConsultationRoutes({ table, db }: AppDeps): void {
  apiRoute(
    table,
    { method: 'post', path: '/api/consultations/propose', access: STAFF, summary: 'The quote Dwell proposes for a consultation; nothing is stored', body: ProposeQuoteRequestSchema, response: ProposedQuoteSchema },
    ({ user, body }) => proposeFor(db, user.salonId, body.consultation, body.serviceId),
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
    { method: 'get', path: '/api/clients/:id/consultations', access: STAFF, summary: "A client's consultations and quotes, newest first", params: IdParamsSchema, response: ConsultationListSchema },
    async ({ user, params }) => ({ consultations: await clientConsultations(db, user.salonId, params.id) }),
  );
}
