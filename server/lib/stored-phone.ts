import { phoneHint, toE164 } from '../../shared/schemas/contact.schemas';
import { AppError } from './app-error';

/**
 * A typed number as it is stored and texted: E.164, read in the salon's country when it has no country
 * code. A number that is not valid there is refused naming the field, before anything is stored.
 */
export function storedPhone<T extends string | null | undefined>(typed: T, country: string, field = 'phone'): T extends string ? string : T {
  if (typed === null || typed === undefined) return typed as never;
  const e164 = toE164(typed, country);
  if (!e164) throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { [field]: phoneHint(country) });
  return e164 as never;
}
