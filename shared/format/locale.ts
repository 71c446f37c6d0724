/**
 * The locale every salon's dates, times and amounts are written in. Dwell's words are English and the
 * salon settings have no language yet, so one locale serves every salon; when a salon setting for it
 * comes, `formatFor` reads it from the salon and nothing else changes.
 */
export const SALON_LOCALE = 'en-US';

/**
 * The country a phone number typed without a country code is read in when the salon has none (the demo salon is in
 * the US). Here rather than in phone.ts, so the schemas that name it do not bring the phone-number metadata along.
 */
export const DEFAULT_PHONE_COUNTRY = 'US';

/** What every date and time formatter needs: the language and the salon's IANA time zone. */
export type FormatContext = { locale: string; timeZone: string };

/** The format context of a salon (or anything that knows its time zone). */
export const formatFor = (timeZone: string): FormatContext => ({ locale: SALON_LOCALE, timeZone });

/** For calendar dates (`YYYY-MM-DD`) and wall-clock settings (`HH:mm`) where no salon is at hand: they have no zone. Never for instants. */
export const zonelessFormat: FormatContext = { locale: SALON_LOCALE, timeZone: 'UTC' };
