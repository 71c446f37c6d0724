import { describe, expect, it } from 'vitest';
import { isRealDateTime, LocalDateSchema } from './common.schemas';

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
