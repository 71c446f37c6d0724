import type { Db } from '@server/db/database';
import type { SessionUser, SignInBody, SignUpBody } from '@shared/schemas/auth.schemas';
import { AppError } from '@server/lib/app-error';
import { hashPassword, isCommonPassword, verifyPassword } from '@server/auth/password';
import { findUserByEmail, insertUser } from './users.repository';
import { lockSignIn, markSucceeded, recordAttempt, signInHistory } from './sign-in-attempts.repository';
import { ACCOUNT_LOOKBACK_DAYS, SIGN_IN_LIMITS, accountWait } from './sign-in-limits';
import { RateLimitedError } from '@server/lib/rate-limit';
import { findSalonIdForSignUp, salonCountry } from '../salon';
import { storedPhone } from '@server/lib/stored-phone';
import { insertClient } from '../clients';

// Verifying against a real hash when the account does not exist keeps the answer time the same,
// so timing does not tell which part was wrong.
const DUMMY_HASH = hashPassword('not-a-real-password-just-for-timing');

/**
 * Checks an e-mail and password within the sign-in limits (sign-in-limits.ts). The attempt is recorded before the
 * password is checked, in the same locked step that counts the earlier ones, so concurrent guesses cannot pass
 * the limit together: each one sees those before it. A right password then marks its attempt a success.
 */
export async function signIn(db: Db, body: SignInBody, ip: string): Promise<SessionUser> {
  const attemptId = await reserveCheck(db, body.email, ip);
  const user = await findUserByEmail(db, body.email);
  const ok = await verifyPassword(user?.passwordHash ?? (await DUMMY_HASH), body.password);
  if (!user || !ok || !user.active) {
    throw new AppError('INVALID_CREDENTIALS', 401, 'That e-mail and password do not match an account.');
  }
  await markSucceeded(db, attemptId);
  const { passwordHash: _hash, active: _active, ...sessionUser } = user;
  return sessionUser;
}

/** Counts this account's and this address's failures and records the new attempt, as one step; 429 over a limit. */
function reserveCheck(db: Db, email: string, ip: string): Promise<string> {
  return db.transaction().execute(async (trx) => {
    await lockSignIn(trx, email, ip);
    const history = await signInHistory(trx, email, ip, {
      knownDays: SIGN_IN_LIMITS.knownAddressDays,
      days: ACCOUNT_LOOKBACK_DAYS,
      addressMinutes: SIGN_IN_LIMITS.perAddress.minutes,
    });
    const { failures, minutes } = SIGN_IN_LIMITS.perAddress;
    if (history.addressFailures >= failures) {
      throw new RateLimitedError(`Too many failed sign-ins from this network. Wait ${minutes} minutes and try again.`, minutes * 60);
    }
    const wait = accountWait(history.accountFailures, history.now);
    if (wait > 0) {
      const inMinutes = Math.ceil(wait / 60_000);
      const when = inMinutes === 1 ? 'a minute' : `${inMinutes} minutes`;
      throw new RateLimitedError(`Too many failed sign-ins for this account. Try again in ${when}, or reset your password.`, Math.ceil(wait / 1000));
    }
    return recordAttempt(trx, email, ip);
  });
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
