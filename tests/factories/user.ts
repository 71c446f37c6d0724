import type { Db } from '@server/db/database';
import type { Role } from '@shared/schemas/common.schemas';
import { hashPassword } from '@server/auth/password';

let seq = 0;
export const TEST_PASSWORD = 'plum-orchard-lantern-42';
// Hashing once keeps factories fast; every test user shares the password.
const passwordHash = hashPassword(TEST_PASSWORD);

export interface UserFixture {
  id: string;
  email: string;
  password: string;
  /** The staff row of a stylist, the client row of a client. */
  staffId?: string;
  clientId?: string;
}

/** A user of the given role; stylists get a staff row, clients a client record. */
export async function insertUser(
  db: Db,
  salonId: string,
  role: Role,
  overrides: { skills?: string[]; maxClientsAtOnce?: number; hours?: { rrule: string; start: string; end: string } } = {},
): Promise<UserFixture> {
  seq++;
  const email = `${role}.${seq}.${Date.now()}@example.test`;
  const user = await db
    .insertInto('users')
    .values({ salon_id: salonId, email, name: `${role} ${seq}`, role, phone: null, password_hash: await passwordHash })
    .returning('id')
    .executeTakeFirstOrThrow();
  const fixture: UserFixture = { id: user.id, email, password: TEST_PASSWORD };
  if (role === 'stylist') {
    const staff = await db
      .insertInto('staff')
      .values({
        salon_id: salonId,
        user_id: user.id,
        display_name: `Stylist ${seq}`,
        skills: overrides.skills ?? ['colour'],
        max_clients_at_once: overrides.maxClientsAtOnce ?? 2,
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    const hours = overrides.hours ?? { rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '09:00', end: '18:00' };
    await db.insertInto('staff_hours').values({ staff_id: staff.id, rrule: hours.rrule, start_time: hours.start, end_time: hours.end }).execute();
    fixture.staffId = staff.id;
  }
  if (role === 'client') {
    const client = await db
      .insertInto('clients')
      .values({ salon_id: salonId, user_id: user.id, name: `Client ${seq}`, email, phone: null })
      .returning('id')
      .executeTakeFirstOrThrow();
    fixture.clientId = client.id;
  }
  return fixture;
}
