import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { ClientAge } from '@shared/schemas/age.schemas';

export async function readClientAge(db: Db, salonId: string, clientId: string): Promise<ClientAge | null> {
  const client = await db
    .selectFrom('clients')
    .select(sql<string | null>`to_char(date_of_birth, 'YYYY-MM-DD')`.as('dateOfBirth'))
    .where('salon_id', '=', salonId)
    .where('id', '=', clientId)
    .executeTakeFirst();
  if (!client) return null;
  const consents = await db
    .selectFrom('guardian_consents')
    .select(['id', 'guardian_name', 'relationship', 'note', 'recorded_by_name', 'recorded_at'])
    .where('client_id', '=', clientId)
    .orderBy('recorded_at')
    .orderBy('id')
    .execute();
  return {
    dateOfBirth: client.dateOfBirth,
    guardianConsents: consents.map((c) => ({
      id: c.id,
      guardianName: c.guardian_name,
      relationship: c.relationship,
      note: c.note,
      recordedByName: c.recorded_by_name,
      recordedAt: c.recorded_at.toISOString(),
    })),
  };
}

export async function setDateOfBirth(db: Db, salonId: string, clientId: string, dateOfBirth: string | null): Promise<void> {
  await db.updateTable('clients').set({ date_of_birth: dateOfBirth }).where('salon_id', '=', salonId).where('id', '=', clientId).execute();
}

export async function insertGuardianConsent(
  db: Db,
  c: { salonId: string; clientId: string; guardianName: string; relationship: string; note: string; recordedBy: string; recordedByName: string },
): Promise<string> {
  const row = await db
    .insertInto('guardian_consents')
    .values({
      salon_id: c.salonId,
      client_id: c.clientId,
      guardian_name: c.guardianName,
      relationship: c.relationship,
      note: c.note,
      recorded_by: c.recordedBy,
      recorded_by_name: c.recordedByName,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}
