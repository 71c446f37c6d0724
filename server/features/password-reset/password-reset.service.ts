import { randomBytes } from 'node:crypto';
import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Mailer } from '@server/mail/mailer';
import { sha256 } from '@server/lib/hash';
import { AppError } from '@server/lib/app-error';
import { hashPassword, isCommonPassword } from '@server/auth/password';
import { findUserByEmail, setPassword } from '../session';
import { consumeReset, deleteSessionsOfUser, insertReset } from './password-resets.repository';

export const RESET_VALID_MINUTES = 30;

/** Sends a one-time link when the account exists; the answer is the same either way. */
export async function requestReset(db: Kysely<Database>, mailer: Mailer, email: string, baseUrl: string): Promise<void> {
  const user = await findUserByEmail(db, email);
  if (!user || !user.active) return;
  const token = await issuePasswordToken(db, user.id, RESET_VALID_MINUTES);
  await mailer.send({
    to: user.email,
    subject: 'Reset your Dwell password',
    text:
      `Hello ${user.name},\n\nUse this link within ${RESET_VALID_MINUTES} minutes to choose a new password:\n` +
      `${baseUrl}/reset-password?token=${token}\n\nIf you did not ask for this, ignore this e-mail; your password stays as it is.`,
  });
}

/** A one-time token that lets a user choose a password (reset, or a new member of staff's invitation). */
export async function issuePasswordToken(db: Kysely<Database>, userId: string, validMinutes: number): Promise<string> {
  // Only the hash is stored: a leaked table cannot be used to reset anyone's password.
  const token = randomBytes(32).toString('base64url');
  await insertReset(db, userId, sha256(token), new Date(Date.now() + validMinutes * 60_000));
  return token;
}

export async function confirmReset(db: Kysely<Database>, token: string, password: string): Promise<void> {
  if (isCommonPassword(password)) {
    throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', {
      password: 'This password is among the most common ones; choose another.',
    });
  }
  const passwordHash = await hashPassword(password);
  await db.transaction().execute(async (trx) => {
    const userId = await consumeReset(trx, sha256(token));
    if (!userId) throw new AppError('RESET_TOKEN_INVALID', 400, 'This reset link is not valid any more; ask for a new one.');
    await setPassword(trx, userId, passwordHash);
    await deleteSessionsOfUser(trx, userId);
  });
}
