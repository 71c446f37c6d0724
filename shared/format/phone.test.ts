import { describe, expect, it } from 'vitest';
import { formatPhone, toE164 } from './phone';

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

describe('formatPhone', () => {
  it('shows a number in the national form at home and with its country code elsewhere', () => {
    // NANP's national presentation is (NPA) NXX-XXXX; ITU-T E.123 international notation groups after "+CC".
    // 555-01xx numbers are kept for fictional use by NANPA; 020 7946 0xxx by Ofcom (drama numbers).
    expect(formatPhone('+19705550142', 'US')).toBe('(970) 555-0142');
    expect(formatPhone('+442079460018', 'US')).toBe('+44 20 7946 0018');
    expect(formatPhone('+442079460018', 'GB')).toBe('020 7946 0018');
  });
  it('shows what cannot be read as it was stored', () => {
    expect(formatPhone('front desk')).toBe('front desk');
  });
});
