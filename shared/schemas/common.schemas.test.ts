import { describe, expect, it } from 'vitest';
import { InstantInputSchema, isRealDateTime, LocalDateSchema } from './common.schemas';

// Days per month and leap years as the Gregorian calendar has them (ISO 8601 uses the proleptic Gregorian calendar).
describe('isRealDateTime', () => {
  it.each(['2027-03-14', '2028-02-29', '2000-02-29', '2027-12-31T23:59', '0050-01-01'])('accepts %s', (s) => expect(isRealDateTime(s)).toBe(true));
  it.each(['2027-02-29', '1900-02-29', '2027-04-31', '2027-13-01', '2027-00-10', '5108-80-46', '2027-03-14T24:00', '2027-03-14T12:60', 'soon'])(
    'refuses %s',
    (s) => expect(isRealDateTime(s)).toBe(false),
  );
  it('makes LocalDateSchema name the problem', () => {
    const res = LocalDateSchema.safeParse('2027-02-30');
    expect(res.success).toBe(false);
    expect(res.error?.issues[0]?.message).toBe('Not a real date');
  });
});

// PostgreSQL's date type has no year 0 (documentation, "Date/Time Types": 4713 BC is followed by 1 BC… and AD 1),
// and JavaScript prints years past 9999 as +010000 (ECMA-262, Date Time String Format): both made 500s before.
describe('the date range', () => {
  it.each(['1900-01-01', '2199-12-31', '2027-03-14'])('accepts %s', (d) => expect(LocalDateSchema.safeParse(d).success).toBe(true));
  it.each(['0000-01-01', '0001-01-01', '1899-12-31', '2200-01-01', '9999-12-31'])('refuses %s, naming the range', (d) => {
    const res = LocalDateSchema.safeParse(d);
    expect(res.success).toBe(false);
    expect(res.error?.issues[0]?.message).toBe('Use a date between 1900-01-01 and 2199-12-31');
  });
  it('holds instants to the same range', () => {
    expect(InstantInputSchema.safeParse('9999-12-31T23:59:59.999Z').success).toBe(false);
    expect(InstantInputSchema.safeParse('2199-12-31T23:59-07:00').success).toBe(true);
  });
});
