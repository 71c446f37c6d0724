import { describe, expect, it } from 'vitest';
import { toE164 } from './phone';

describe('toE164', () => {
  it('writes a number in ITU-T E.164 (+, country code, national number), read in the salon’s country', () => {
    // 555-01xx numbers are kept for fictional use by NANPA; 020 7946 0xxx by Ofcom (drama numbers).
    expect(toE164('(970) 555-0142', 'US')).toBe('+19705550142');
    expect(toE164('020 7946 0018', 'GB')).toBe('+442079460018');
    expect(toE164('+1 970 555 0142', 'GB')).toBe('+19705550142');
  });
  it('answers null for a number that is not valid there', () => {
    expect(toE164('12345', 'US')).toBeNull();
  });
});
