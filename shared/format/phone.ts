import { isSupportedCountry, parsePhoneNumberFromString } from 'libphonenumber-js';
import { DEFAULT_PHONE_COUNTRY } from './locale';

/*
 * Phone numbers, read and written by libphonenumber-js: the one place both sides turn a typed number into
 * the form it is stored, texted and shown in (E.164, e.g. +19705550142).
 */

/** The number in E.164 (+19705550142), or null when libphonenumber-js does not find a valid number. */
export function toE164(input: string, country: string = DEFAULT_PHONE_COUNTRY): string | null {
  const parsed = parsePhoneNumberFromString(input.trim(), isSupportedCountry(country) ? country : DEFAULT_PHONE_COUNTRY);
  return parsed?.isValid() ? parsed.number : null;
}

/**
 * A stored number as people read it: in the national form for the salon's own country ((970) 555-0142), with its
 * country code for any other (+44 20 7946 0018). Anything libphonenumber-js cannot read is shown as stored.
 */
export function formatPhone(stored: string, country: string = DEFAULT_PHONE_COUNTRY): string {
  const parsed = parsePhoneNumberFromString(stored);
  if (!parsed) return stored;
  return parsed.country === country ? parsed.formatNational() : parsed.formatInternational();
}
