import type { z } from 'zod';
import type { SessionUser } from '../../../shared/schemas/auth.schemas';
import type { ClientAge, RecordGuardianConsentSchema } from '../../../shared/schemas/age.schemas';
import type { Db } from '../../db/database';
import { invalidField, notFound } from '../../lib/app-error';
import { writeAudit } from '../audit/audit.repository';
import { userName } from '../session/users.repository';
import { findClientIdForUser } from './clients.repository';
import { insertGuardianConsent, readClientAge, setDateOfBirth } from './client-age.repository';

export async function clientAge(db: Db, salonId: string, clientId: string): Promise<ClientAge> {
  const age = await readClientAge(db, salonId, clientId);
  if (!age) throw notFound('That client');
  return age;
}

/** Sets (or removes) a date of birth: the desk for any client of its salon, a client for themselves. Audited. */
export async function recordDateOfBirth(db: Db, user: SessionUser, clientId: string, dateOfBirth: string | null, today: string): Promise<ClientAge> {
  if (dateOfBirth && dateOfBirth > today) throw invalidField('dateOfBirth', 'A date of birth cannot be in the future.');
  return db.transaction().execute(async (trx) => {
    const before = await clientAge(trx, user.salonId, clientId);
    await setDateOfBirth(trx, user.salonId, clientId, dateOfBirth);
    await writeAudit(trx, { salonId: user.salonId, actorUserId: user.id, entity: 'client', entityId: clientId, action: 'date of birth', before: { dateOfBirth: before.dateOfBirth }, after: { dateOfBirth } });
    return clientAge(trx, user.salonId, clientId);
  });
}

export async function ownClientId(db: Db, user: SessionUser): Promise<string> {
  const id = await findClientIdForUser(db, user.id);
  if (!id) throw notFound('Your client record');
  return id;
}

/** The desk records a guardian's consent (who consented, how related, who recorded it, when); kept and audited. */
export async function recordGuardianConsent(db: Db, user: SessionUser, clientId: string, body: z.infer<typeof RecordGuardianConsentSchema>): Promise<ClientAge> {
  return db.transaction().execute(async (trx) => {
    await clientAge(trx, user.salonId, clientId);
    const id = await insertGuardianConsent(trx, { salonId: user.salonId, clientId, ...body, recordedBy: user.id, recordedByName: await userName(trx, user.id) });
    await writeAudit(trx, { salonId: user.salonId, actorUserId: user.id, entity: 'client', entityId: clientId, action: 'guardian consent recorded', after: { id, ...body } });
    return clientAge(trx, user.salonId, clientId);
  });
}
