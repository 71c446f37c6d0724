import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';

export interface UserWithPassword extends SessionUser {
  passwordHash: string;
  active: boolean;
}

const sessionColumns = ['id', 'email', 'name', 'role', 'salon_id'] as const;

function toSessionUser(row: { id: string; email: string; name: string; role: SessionUser['role']; salon_id: string }): SessionUser {
  return { id: row.id, email: row.email, name: row.name, role: row.role, salonId: row.salon_id };
}

/** The signed-in user behind a session; undefined once the account is deactivated. */
export async function findSessionUser(db: Db, id: string): Promise<SessionUser | undefined> {
  const row = await db.selectFrom('users').select(sessionColumns).where('id', '=', id).where('active', '=', true).executeTakeFirst();
  return row && toSessionUser(row);
}

export async function findUserByEmail(db: Db, email: string): Promise<UserWithPassword | undefined> {
  const row = await db
    .selectFrom('users')
    .select([...sessionColumns, 'password_hash', 'active'])
    .where((eb) => eb(eb.fn('lower', ['email']), '=', email.toLowerCase()))
    .executeTakeFirst();
  return row && { ...toSessionUser(row), passwordHash: row.password_hash, active: row.active };
}

export async function insertUser(
  db: Db,
  user: { salonId: string; email: string; name: string; phone: string | null; role: SessionUser['role']; passwordHash: string },
): Promise<SessionUser> {
  const row = await db
    .insertInto('users')
    .values({
      salon_id: user.salonId,
      email: user.email,
      name: user.name,
      phone: user.phone,
      role: user.role,
      password_hash: user.passwordHash,
    })
    .returning(sessionColumns)
    .executeTakeFirstOrThrow();
  return toSessionUser(row);
}

export async function setPassword(db: Db, userId: string, passwordHash: string): Promise<void> {
  await db.updateTable('users').set({ password_hash: passwordHash, password_changed_at: new Date() }).where('id', '=', userId).execute();
}

/** A user's name as it is now, for records that keep who wrote them after the account goes. */
export async function userName(db: Db, id: string): Promise<string> {
  return (await db.selectFrom('users').select('name').where('id', '=', id).executeTakeFirstOrThrow()).name;
}
