import type { ErrorCode } from '@shared/api/error-codes';
import { AppError } from './app-error';

/** PostgreSQL's unique_violation (SQLSTATE 23505, PostgreSQL documentation, Appendix A "Error Codes"), with the constraint it broke. */
export function isUniqueViolation(e: unknown): e is { code: '23505'; constraint?: string } {
  return (e as { code?: unknown } | null)?.code === '23505';
}

interface Meaning {
  code: ErrorCode;
  /** The request field the constraint keeps unique, named in the answer so a form shows it there. */
  field?: string;
  message: string;
}

const nameTaken = (what: string): Meaning => ({ code: 'CONFLICT', field: 'name', message: `Another ${what} already has this name.` });

// What each unique constraint a request can run into keeps unique. A check before the insert ("is this e-mail
// taken?") answers the usual case with its own words; these answer the race the check cannot see, where two
// requests pass it at once and the database lets one in.
const MEANINGS: Record<string, Meaning> = {
  users_email: { code: 'EMAIL_TAKEN', field: 'email', message: 'An account with this e-mail already exists.' },
  chairs_salon_id_name_key: nameTaken('chair'),
  basins_salon_id_name_key: nameTaken('basin'),
  services_salon_id_name_key: nameTaken('service'),
  retail_products_salon_id_name_key: nameTaken('product'),
  day_closes_one_standing: { code: 'CONFLICT', message: 'This day is closed already; the owner can reopen it to close it again.' },
  mix_logs_booking_id_sitting_seq_bowl_no_key: { code: 'CONFLICT', field: 'bowlNo', message: 'This bowl of this sitting is already written.' },
};

/** The answer to a unique violation: 409, naming the field its constraint keeps unique where one does. */
export function uniqueViolationError(e: { constraint?: string }): AppError {
  const meaning = MEANINGS[e.constraint ?? ''];
  if (!meaning) return new AppError('CONFLICT', 409, 'Someone saved the same thing at the same moment; reload and try again.');
  return new AppError(meaning.code, 409, meaning.message, meaning.field ? { [meaning.field]: meaning.message } : undefined);
}
