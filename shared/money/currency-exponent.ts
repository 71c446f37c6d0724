/**
 * How many decimal places (minor units) each currency has: ISO 4217 List One, column "Minor unit".
 * Every currency not listed here has 2. Intl's own digits come from CLDR and differ from ISO 4217 for
 * some currencies (IQD, HUF, IDR…), so amounts are stored and shown by this table, not by Intl.
 */
const NOT_TWO: Readonly<Record<string, number>> = {
  // ISO 4217: no minor unit.
  BIF: 0,
  CLP: 0,
  DJF: 0,
  GNF: 0,
  ISK: 0,
  JPY: 0,
  KMF: 0,
  KRW: 0,
  PYG: 0,
  RWF: 0,
  UGX: 0,
  UYI: 0,
  VND: 0,
  VUV: 0,
  XAF: 0,
  XOF: 0,
  XPF: 0,
  // ISO 4217: three decimal places.
  BHD: 3,
  IQD: 3,
  JOD: 3,
  KWD: 3,
  LYD: 3,
  OMR: 3,
  TND: 3,
  // ISO 4217: four decimal places (units of account).
  CLF: 4,
  UYW: 4,
};

/** Decimal places of a three-letter ISO 4217 code: JPY 0, USD 2, KWD 3. */
export function currencyExponent(currency: string): number {
  return NOT_TWO[currency.toUpperCase()] ?? 2;
}

/** Minor units in one whole unit: 1 for JPY, 100 for USD, 1000 for KWD. */
export function minorPerUnit(currency: string): number {
  return 10 ** currencyExponent(currency);
}
