import { describe, expect, it } from 'vitest';
import { cardDigits, cardFieldsSchema, passesLuhn } from './card-fields';

const schema = cardFieldsSchema({ year: 2027, month: 3 });
const fields = (over: Partial<Record<'number' | 'month' | 'year' | 'cvc', string>> = {}) => ({
  number: '4242 4242 4242 4242',
  month: '04',
  year: '2030',
  cvc: '123',
  ...over,
});
const messages = (input: ReturnType<typeof fields>) => {
  const result = schema.safeParse(input);
  return result.success ? {} : Object.fromEntries(result.error.issues.map((i) => [i.path.join('.'), i.message]));
};

describe('cardFieldsSchema', () => {
  it('turns the typed fields into the card the pay call sends', () => {
    expect(schema.parse(fields())).toEqual({ number: '4242424242424242', expMonth: 4, expYear: 2030, cvc: '123' });
  });

  it('accepts dashes, a one-digit month and a two-digit year', () => {
    expect(schema.parse(fields({ number: '4000-0000-0000-0002', month: '7', year: '29' }))).toEqual({
      number: '4000000000000002',
      expMonth: 7,
      expYear: 2029,
      cvc: '123',
    });
  });

  it('says which field is wrong', () => {
    expect(messages(fields({ number: '4242' }))).toEqual({ number: 'Enter the card number' });
    expect(messages(fields({ number: '4242 4242 4242 4241' }))).toEqual({ number: 'Check the card number' });
    expect(messages(fields({ month: '13' }))).toEqual({ month: 'Enter the month, 1 to 12' });
    expect(messages(fields({ year: '203' }))).toEqual({ year: 'Enter the year, e.g. 2030' });
    expect(messages(fields({ cvc: '12' }))).toEqual({ cvc: 'Enter the 3 or 4 digits on the back' });
  });

  it('refuses a card that expired before this month, and accepts one that runs out this month', () => {
    expect(messages(fields({ month: '2', year: '2027' }))).toEqual({ year: 'This card has expired' });
    expect(schema.parse(fields({ month: '3', year: '2027' })).expMonth).toBe(3);
  });
});

describe('passesLuhn', () => {
  it('passes the demo test cards and fails a typo', () => {
    expect(passesLuhn(cardDigits('4242 4242 4242 4242'))).toBe(true);
    expect(passesLuhn(cardDigits('4000 0000 0000 0002'))).toBe(true);
    expect(passesLuhn('4242424242424243')).toBe(false);
    expect(passesLuhn('')).toBe(false);
  });
});
