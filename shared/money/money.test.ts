import { describe, expect, it } from 'vitest';
import { currencyExponent, minorPerUnit } from './currency-exponent';
import { formatMoney, minorToUnits, moneyInputText, parseMoney } from './money';

describe('currencyExponent', () => {
  it('follows ISO 4217 List One, not Intl', () => {
    // ISO 4217: USD, EUR and GBP have 2 decimal places.
    expect([currencyExponent('USD'), currencyExponent('EUR'), currencyExponent('GBP')]).toEqual([2, 2, 2]);
    // ISO 4217: JPY and KRW have no minor unit.
    expect([currencyExponent('JPY'), currencyExponent('KRW')]).toEqual([0, 0]);
    // ISO 4217: KWD, BHD and IQD have 3 (CLDR, which Intl reads, gives IQD 0).
    expect([currencyExponent('KWD'), currencyExponent('BHD'), currencyExponent('IQD')]).toEqual([3, 3, 3]);
    // ISO 4217: CLF (a unit of account) has 4.
    expect(currencyExponent('CLF')).toBe(4);
    expect([minorPerUnit('JPY'), minorPerUnit('USD'), minorPerUnit('KWD')]).toEqual([1, 100, 1000]);
  });
});

describe('formatMoney', () => {
  it('writes the amount with the currency’s own decimals', () => {
    expect(formatMoney(2500, 'USD')).toBe('$25.00'); // ISO 4217 USD: 2 decimals
    expect(formatMoney(2500, 'JPY')).toBe('¥2,500'); // ISO 4217 JPY: 0 decimals
    expect(formatMoney(2500, 'KWD')).toBe('KWD 2.500'); // ISO 4217 KWD: 3 decimals, plain space
    expect(formatMoney(123456, 'EUR')).toBe('€1,234.56');
    expect(formatMoney(0, 'GBP')).toBe('£0.00');
  });
});

describe('parseMoney', () => {
  it('reads typed amounts into minor units', () => {
    expect(parseMoney('260', 'USD')).toBe(26000);
    expect(parseMoney(' 260.5 ', 'USD')).toBe(26050);
    expect(parseMoney('.75', 'USD')).toBe(75);
    expect(parseMoney('1,234.50', 'USD')).toBe(123450);
    expect(parseMoney('2500', 'JPY')).toBe(2500); // ISO 4217 JPY: the yen is the minor unit
    expect(parseMoney('2.5', 'KWD')).toBe(2500); // ISO 4217 KWD: 1000 fils to the dinar
  });
  it('rounds digits beyond the minor unit half away from zero, without binary fractions', () => {
    expect(parseMoney('1.005', 'USD')).toBe(101); // 1.005 * 100 in floating point is 100.49999…
    expect(parseMoney('1.004', 'USD')).toBe(100);
    expect(parseMoney('2499.5', 'JPY')).toBe(2500);
  });
  it('refuses what is not an amount', () => {
    for (const text of ['', ' ', '.', 'abc', '1,5', '12,34', '1.2.3', '1e3', '$5']) expect(parseMoney(text, 'USD')).toBeNull();
  });
});

describe('round trip', () => {
  it('what the field shows reads back as the same amount', () => {
    for (const [minor, currency] of [
      [26000, 'USD'],
      [5, 'USD'],
      [2500, 'JPY'],
      [2500, 'KWD'],
      [1, 'KWD'],
    ] as const) {
      expect(parseMoney(moneyInputText(minor, currency), currency)).toBe(minor);
      expect(parseMoney(String(minorToUnits(minor, currency)), currency)).toBe(minor);
    }
    expect(moneyInputText(26000, 'USD')).toBe('260.00');
    expect(moneyInputText(2500, 'JPY')).toBe('2500');
    expect(moneyInputText(2500, 'KWD')).toBe('2.500');
  });
});
