import { IdParamsSchema } from '../schemas/common.schemas';
import {
  ConsultationListSchema,
  ConsultationViewSchema,
  CreateConsultationSchema,
  ProposeQuoteRequestSchema,
  ProposedQuoteSchema,
  QuoteEditSchema,
} from '../schemas/consultation.schemas';
import { STAFF, endpoint } from './endpoint';

/**
 * Consultations and their quotes. Stylists, desk and owner record consultations and edit quotes; the desk books
 * them (bookings.quoteId); a client reads and accepts the quotes sent to them.
 */
export const consultationsApi = {
  propose: endpoint({
    method: 'post',
    path: '/api/consultations/propose',
    access: STAFF,
    summary: 'The quote Dwell proposes for a consultation; nothing is stored',
    body: ProposeQuoteRequestSchema,
    response: ProposedQuoteSchema,
  }),
  create: endpoint({
    method: 'post',
    path: '/api/consultations',
    access: STAFF,
    summary: 'Record a consultation with its (edited) quote',
    body: CreateConsultationSchema,
    response: ConsultationViewSchema,
    status: 201,
  }),
  one: endpoint({
    method: 'get',
    path: '/api/consultations/:id',
    access: STAFF,
    summary: 'One consultation and its quote',
    params: IdParamsSchema,
    response: ConsultationViewSchema,
  }),
  editQuote: endpoint({
    method: 'put',
    path: '/api/consultations/:id/quote',
    access: STAFF,
    summary: 'Save an edited quote (back to draft if it was sent)',
    params: IdParamsSchema,
    body: QuoteEditSchema,
    response: ConsultationViewSchema,
  }),
  sendQuote: endpoint({
    method: 'post',
    path: '/api/consultations/:id/quote/send',
    access: STAFF,
    summary: 'E-mail the quote to the client (status sent)',
    params: IdParamsSchema,
    response: ConsultationViewSchema,
  }),
  myQuotes: endpoint({
    method: 'get',
    path: '/api/me/quotes',
    access: ['client'],
    summary: "The signed-in client's quotes sent to them",
    response: ConsultationListSchema,
  }),
  acceptMyQuote: endpoint({
    method: 'post',
    path: '/api/me/quotes/:id/accept',
    access: ['client'],
    summary: 'The signed-in client accepts a quote sent to them',
    params: IdParamsSchema,
    response: ConsultationViewSchema,
  }),
  ofClient: endpoint({
    method: 'get',
    path: '/api/clients/:id/consultations',
    access: STAFF,
    summary: "A client's consultations and quotes, newest first",
    params: IdParamsSchema,
    response: ConsultationListSchema,
  }),
};
