import { describe, expect, it } from 'vitest';
import { availabilityText } from './weekdays';

describe('availabilityText', () => {
  it('writes a run of days as a range', () => {
    expect(availabilityText({ weekdays: [3, 1, 2, 4, 5], from: '09:00', to: '12:00' })).toBe('Mon–Fri 9:00 AM – 12:00 PM');
  });
  it('lists days that are not a run', () => {
    expect(availabilityText({ weekdays: [6, 2], from: '14:00', to: '18:00' })).toBe('Tue, Sat 2:00 PM – 6:00 PM');
  });
});
