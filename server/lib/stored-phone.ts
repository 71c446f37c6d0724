import { phoneHint } from '@shared/schemas/contact.schemas';
import { toE164 } from '@shared/format/phone';
import { AppError } from './app-error';

/**
 * A typed number as it is stored and texted: E.164, read in the salon's country when it has no country
 * code. A number that is not valid there is refused naming the field, before anything is stored; no
 * number (null or left out) stays as it is.
 */
export function storedPhone(typed: string, country: string, field?: string): string;
export function storedPhone(typed: string | null, country: string, field?: string): string | null;
export function storedPhone(typed: string | null | undefined, country: string, field?: string): string | null | undefined;
export function storedPhone(typed: string | null | undefined, country: string, field = 'phone'): string | null | undefined {
  if (typed === null || typed === undefined) return typed;
  const e164 = toE164(typed, country);
  if (!e164) throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { [field]: phoneHint(country) });
  return e164;
}
