import { clientsApi } from '@shared/api/clients.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { addGuardianConsent, clientAge, myAge, setClientDateOfBirth, setMyDateOfBirth } from './client-age.service';

/** Date of birth and guardian consent: oxidative colour for a client under 16 needs a guardian's consent on record. */
export function registerClientAgeRoutes({ table, db }: AppDeps): void {
  apiRoute(table, clientsApi.age, ({ user, params }) => clientAge(db, user, params.id));
  apiRoute(table, clientsApi.setDateOfBirth, ({ user, params, body }) => setClientDateOfBirth(db, user, params.id, body.dateOfBirth, new Date()));
  apiRoute(table, clientsApi.myAge, ({ user }) => myAge(db, user));
  apiRoute(table, clientsApi.setMyDateOfBirth, ({ user, body }) => setMyDateOfBirth(db, user, body.dateOfBirth, new Date()));
  apiRoute(table, clientsApi.addGuardianConsent, ({ user, params, body }) => addGuardianConsent(db, user, params.id, body));
}
