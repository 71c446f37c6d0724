import { describe, expect, it } from 'vitest';
import { stepOfKind } from './step-plan-form';

describe('stepOfKind', () => {
  it('carries the label and length over to a developing step', () => {
    expect(stepOfKind('developing', { kind: 'hands_on', label: 'Toner', product: 'toner_direct', minutes: 20 })).toEqual({
      kind: 'developing',
      label: 'Toner',
      product: 'toner_direct',
      minMinutes: 20,
      maxMinutes: 20,
    });
  });
  it('keeps a basin step within its limit', () => {
    expect(stepOfKind('basin', { kind: 'developing', label: 'Rinse', product: 'none', minMinutes: 30, maxMinutes: 200 })).toEqual({
      kind: 'basin',
      label: 'Rinse',
      product: 'none',
      minutes: 120,
    });
  });
});
