import type { Db } from '@server/db/database';
import type { SessionUser, SignInBody, SignUpBody } from '@shared/schemas/auth.schemas';
import { AppError } from '@server/lib/app-error';
import { hashPassword, isCommonPassword, verifyPassword } from '@server/auth/password';
import { findUserByEmail, insertUser } from './users.repository';
import { recordAttempt, recentFailures } from './sign-in-attempts.repository';
import { findSalonIdForSignUp, salonCountry } from '../salon';
import { storedPhone } from '@server/lib/stored-phone';
import { insertClient } from '../clients';

/** Common practice for sign-in throttling: a handful of failures per account, more per network address. */
export const SIGN_IN_LIMITS = { windowMinutes: 15, perAccount: 5, perAddress: 20 };

// Verifying against a real hash when the account does not exist keeps the answer time the same,
// so timing does not tell which part was wrong.
const DUMMY_HASH = hashPassword('not-a-real-password-just-for-timing');

export async function signIn(db: Db, body: SignInBody, ip: string): Promise<SessionUser> {
  const failures = await recentFailures(db, body.email, ip, SIGN_IN_LIMITS.windowMinutes);
  if (failures.byEmail >= SIGN_IN_LIMITS.perAccount || failures.byIp >= SIGN_IN_LIMITS.perAddress) {
    throw new AppError('RATE_LIMITED', 429, 'Too many failed sign-ins. Wait 15 minutes and try again.');
  }
  const user = await findUserByEmail(db, body.email);
  const ok = await verifyPassword(user?.passwordHash ?? (await DUMMY_HASH), body.password);
  await recordAttempt(db, body.email, ip, Boolean(user && ok && user.active));
  if (!user || !ok || !user.active) {
    throw new AppError('INVALID_CREDENTIALS', 401, 'That e-mail and password do not match an account.');
  }
  const { passwordHash: _hash, active: _active, ...sessionUser } = user;
  return sessionUser;
}

/** A client creates their own account (and their client record at the salon). */
export async function signUp(db: Db, body: SignUpBody): Promise<SessionUser> {
  if (isCommonPassword(body.password)) {
    throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', {
      password: 'This password is among the most common ones; choose another.',
    });
  }
  if (await findUserByEmail(db, body.email)) {
    throw new AppError('EMAIL_TAKEN', 409, 'An account with this e-mail exists; sign in or reset the password.');
  }
  const salonId = await findSalonIdForSignUp(db, body.salonSlug);
  const phone = storedPhone(body.phone, await salonCountry(db, salonId));
  const passwordHash = await hashPassword(body.password);
  return db.transaction().execute(async (trx) => {
    const user = await insertUser(trx, { salonId, email: body.email, name: body.name, phone, role: 'client', passwordHash });
    await insertClient(trx, { salonId, userId: user.id, name: body.name, email: body.email, phone });
    return user;
  });
}
