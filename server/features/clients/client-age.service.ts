import { DateTime } from 'luxon';
import type { z } from 'zod';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { ClientAge, RecordGuardianConsentSchema } from '@shared/schemas/age.schemas';
import type { Db } from '@server/db/database';
import { invalidField, notFound } from '@server/lib/app-error';
import { myClientId } from '@server/auth/client-access';
import { writeAudit } from '../audit';
import { findSalon } from '../salon';
import { userName } from '../session';
import { insertGuardianConsent, readClientAge, setDateOfBirth } from './client-age.repository';

/** A client's age record within the user's salon. */
export async function clientAge(db: Db, user: SessionUser, clientId: string): Promise<ClientAge> {
  const age = await readClientAge(db, user.salonId, clientId);
  if (!age) throw notFound('That client');
  return age;
}

/** The signed-in client's own age record. */
export async function myAge(db: Db, user: SessionUser): Promise<ClientAge> {
  return clientAge(db, user, await myClientId(db, user));
}

/** A client sets (or removes) their own date of birth. */
export async function setMyDateOfBirth(db: Db, user: SessionUser, dateOfBirth: string | null, now: Date): Promise<ClientAge> {
  return setClientDateOfBirth(db, user, await myClientId(db, user), dateOfBirth, now);
}

/** Sets (or removes) a date of birth, never one after today in the salon's time zone; audited. The desk for any client of its salon. */
export async function setClientDateOfBirth(db: Db, user: SessionUser, clientId: string, dateOfBirth: string | null, now: Date): Promise<ClientAge> {
  const today = DateTime.fromJSDate(now, { zone: (await findSalon(db, user.salonId)).timeZone }).toISODate()!;
  if (dateOfBirth && dateOfBirth > today) throw invalidField('dateOfBirth', 'A date of birth cannot be in the future.');
  return db.transaction().execute(async (trx) => {
    const before = await clientAge(trx, user, clientId);
    await setDateOfBirth(trx, user.salonId, clientId, dateOfBirth);
    await writeAudit(trx, {
      salonId: user.salonId,
      actorUserId: user.id,
      entity: 'client',
      entityId: clientId,
      action: 'date of birth',
      before: { dateOfBirth: before.dateOfBirth },
      after: { dateOfBirth },
    });
    return clientAge(trx, user, clientId);
  });
}

/** The desk records a guardian's consent (who consented, how related, who recorded it, when); kept and audited. */
export async function addGuardianConsent(db: Db, user: SessionUser, clientId: string, body: z.infer<typeof RecordGuardianConsentSchema>): Promise<ClientAge> {
  return db.transaction().execute(async (trx) => {
    await clientAge(trx, user, clientId);
    const id = await insertGuardianConsent(trx, {
      salonId: user.salonId,
      clientId,
      ...body,
      recordedBy: user.id,
      recordedByName: await userName(trx, user.id),
    });
    await writeAudit(trx, {
      salonId: user.salonId,
      actorUserId: user.id,
      entity: 'client',
      entityId: clientId,
      action: 'guardian consent recorded',
      after: { id, ...body },
    });
    return clientAge(trx, user, clientId);
  });
}
