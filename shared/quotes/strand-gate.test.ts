import { describe, expect, it } from 'vitest';
import type { StepPlan } from '../schemas/step-plan.schemas';
import { gatedSteps, strandOutcome, strandOverrideProblem } from './strand-gate';

const lightening: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'hands_on', label: 'Apply lightener', product: 'lightener', minutes: 20 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 10 },
      ],
    },
  ],
};
const care: StepPlan = { sittings: [{ steps: [{ kind: 'basin', label: 'Bond treatment', product: 'bond_care', minutes: 15 }] }] };

describe('strand-test gate', () => {
  it('goes by the more careful of the consultation and the latest recorded test', () => {
    expect(strandOutcome('passed', 'failed')).toBe('failed');
    expect(strandOutcome('failed', 'passed')).toBe('failed');
    expect(strandOutcome('none', 'fragile')).toBe('fragile');
    expect(strandOutcome('fragile', null)).toBe('fragile');
  });

  it('after a failed test, lightener or remover needs a written reason of at least 10 characters', () => {
    expect(gatedSteps(lightening)).toEqual(['sitting 1, step 1 “Apply lightener”']);
    expect(strandOverrideProblem(lightening, 'failed', '')).toMatch(/strand test failed.*sitting 1, step 1 “Apply lightener”.*at least 10 characters/);
    // Spaces around do not count: 'too short' is 9 characters, one short; 'not so short' is 12.
    expect(strandOverrideProblem(lightening, 'failed', '   too short   ')).not.toBeNull();
    expect(strandOverrideProblem(lightening, 'failed', 'not so short')).toBeNull();
    expect(strandOverrideProblem(lightening, 'failed', 'Client insists; re-tested the nape, held')).toBeNull();
    expect(strandOverrideProblem(lightening, 'passed', '')).toBeNull();
    expect(strandOverrideProblem(care, 'failed', '')).toBeNull();
  });
});
