import { DateTime } from 'luxon';
import { IdParamsSchema } from '../../../shared/schemas/common.schemas';
import { ClientAgeSchema, DateOfBirthBodySchema, RecordGuardianConsentSchema } from '../../../shared/schemas/age.schemas';
import type { AppDeps } from '../../app-deps';
import { DESK, STAFF } from '../../auth/require-access';
import { apiRoute } from '../../lib/api-route';
import { findSalon } from '../salon/salon.repository';
import { clientAge, ownClientId, recordDateOfBirth, recordGuardianConsent } from './client-age.service';

/** Date of birth and guardian consent: oxidative colour for a client under 16 needs a guardian's consent on record. */
export function registerClientAgeRoutes({ table, db }: AppDeps): void {
  const today = async (salonId: string) => DateTime.now().setZone((await findSalon(db, salonId)).timeZone).toISODate()!;
  apiRoute(
    table,
    { method: 'get', path: '/api/clients/:id/age', access: STAFF, summary: "A client's date of birth and guardian consents", params: IdParamsSchema, response: ClientAgeSchema },
    async ({ user, params }) => clientAge(db, user.salonId, params.id),
  );
  apiRoute(
    table,
    { method: 'put', path: '/api/clients/:id/date-of-birth', access: DESK, summary: "Set or remove a client's date of birth (audited)", params: IdParamsSchema, body: DateOfBirthBodySchema, response: ClientAgeSchema },
    async ({ user, params, body }) => recordDateOfBirth(db, user, params.id, body.dateOfBirth, await today(user.salonId)),
  );
  apiRoute(
    table,
    { method: 'get', path: '/api/me/age', access: ['client'], summary: 'My date of birth and any guardian consent on record', response: ClientAgeSchema },
    async ({ user }) => clientAge(db, user.salonId, await ownClientId(db, user)),
  );
  apiRoute(
    table,
    { method: 'put', path: '/api/me/date-of-birth', access: ['client'], summary: 'Set or remove my date of birth', body: DateOfBirthBodySchema, response: ClientAgeSchema },
    async ({ user, body }) => recordDateOfBirth(db, user, await ownClientId(db, user), body.dateOfBirth, await today(user.salonId)),
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/clients/:id/guardian-consents', access: DESK, summary: "Record a guardian's consent to oxidative colour for a client under 16 (kept and audited)", params: IdParamsSchema, body: RecordGuardianConsentSchema, response: ClientAgeSchema, status: 201 },
    async ({ user, params, body }) => recordGuardianConsent(db, user, params.id, body),
  );
}
