import { describe, expect, it } from 'vitest';
import { formatMinutes } from './time';

describe('formatMinutes', () => {
  it('writes hours and minutes', () => {
    expect(formatMinutes(45)).toBe('45 min');
    expect(formatMinutes(120)).toBe('2 h');
    expect(formatMinutes(450)).toBe('7 h 30 min');
  });
});
