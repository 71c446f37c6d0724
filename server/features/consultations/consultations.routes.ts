import { consultationsApi } from '@shared/api/consultations.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { acceptMyQuote, clientConsultations, createConsultation, editQuote, myQuotes, oneConsultation, proposeFor, sendQuote } from './consultations.service';

export function registerConsultationRoutes({ table, db, mailer, config }: AppDeps): void {
  apiRoute(table, consultationsApi.propose, ({ user, body }) => proposeFor(db, user, body));
  apiRoute(table, consultationsApi.create, ({ user, body }) => createConsultation(db, user, body));
  apiRoute(table, consultationsApi.one, ({ user, params }) => oneConsultation(db, user, params.id));
  apiRoute(table, consultationsApi.editQuote, ({ user, params, body }) => editQuote(db, user, params.id, body));
  // The e-mail links to the client's page on the address the salon is served at (this request's, unless configured).
  apiRoute(table, consultationsApi.sendQuote, ({ user, params, req }) =>
    sendQuote(db, mailer, user, params.id, `${config.publicUrl ?? `${req.protocol}://${req.get('host')}`}/me`, new Date()),
  );
  apiRoute(table, consultationsApi.myQuotes, ({ user }) => myQuotes(db, user));
  apiRoute(table, consultationsApi.acceptMyQuote, ({ user, params }) => acceptMyQuote(db, user, params.id, new Date()));
  apiRoute(table, consultationsApi.ofClient, ({ user, params }) => clientConsultations(db, user, params.id));
}
