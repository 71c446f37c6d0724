import { SALON_LOCALE } from '../format/locale';
import { plainSpaces } from '../format/plain-spaces';
import { currencyExponent } from './currency-exponent';
import { parseDecimal } from './decimal-text';

/*
 * Amounts are whole numbers of the currency's minor unit (cents for USD, yen for JPY, fils for KWD),
 * the API's `…Cents` fields. These are the only conversions between them and what people read or type.
 */

const formatters = new Map<string, Intl.NumberFormat>();

/** The one way an amount is written, on screens, in e-mails and texts: "$25.00", "¥2,500", "KWD 2.500". */
export function formatMoney(minor: number, currency: string, locale: string = SALON_LOCALE): string {
  const digits = currencyExponent(currency);
  const key = `${locale}|${currency}`;
  let format = formatters.get(key);
  if (!format) {
    format = new Intl.NumberFormat(locale, { style: 'currency', currency, minimumFractionDigits: digits, maximumFractionDigits: digits });
    formatters.set(key, format);
  }
  return plainSpaces(format.format(minorToUnits(minor, currency)));
}

/** The amount in whole units as a number (25 for 2500 USD cents), for CSV cells and sorting. */
export function minorToUnits(minor: number, currency: string): number {
  const digits = currencyExponent(currency);
  return Number((Math.round(minor) / 10 ** digits).toFixed(digits));
}

/** The amount as a person types it, without symbol or grouping: "260.00", "2500", "2.500". */
export function moneyInputText(minor: number, currency: string): string {
  return minorToUnits(minor, currency).toFixed(currencyExponent(currency));
}

/**
 * A typed amount ("260", "260.5", ".75", "1,234.50") in minor units, or null when it is not a number.
 * Commas are read as thousands separators only in groups of three, so "1,5" is refused rather than
 * guessed; digits beyond the currency's minor unit round half away from zero.
 */
export function parseMoney(text: string, currency: string): number | null {
  return parseDecimal(text, currencyExponent(currency));
}
