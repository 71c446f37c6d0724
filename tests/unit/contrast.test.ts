import { describe, expect, it } from 'vitest';
import config from '../../tailwind.config';

// WCAG 2.x contrast ratio: (L1 + 0.05) / (L2 + 0.05) of the relative luminances (WCAG 2.1, "relative luminance").
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((v) => (v <= 0.03928 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
}
const contrast = (a: string, b: string) => {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x) as [number, number];
  return (hi + 0.05) / (lo + 0.05);
};

const colors = config.theme.extend.colors;

describe('the edges of controls', () => {
  it('stand out 3:1 from the white and linen they sit on (WCAG 2.1 SC 1.4.11, non-text contrast)', () => {
    expect(contrast(colors.edge, '#FFFFFF')).toBeGreaterThanOrEqual(3);
    expect(contrast(colors.edge, colors.linen)).toBeGreaterThanOrEqual(3);
  });
  it('uses the formula as WCAG defines it (black on white is 21:1)', () => {
    expect(contrast('#000000', '#FFFFFF')).toBeCloseTo(21, 5);
  });
});
