import { describe, expect, it } from 'vitest';
import { flowStepsFor, flowStepNames } from './flow-steps';

describe('flowStepsFor', () => {
  it('leaves out "Sign in" for someone already signed in', () => {
    expect(flowStepsFor(true).map((s) => flowStepNames[s])).toEqual(['Choose a time', 'Your details', 'Before you pay', 'Deposit']);
    expect(flowStepsFor(false).map((s) => flowStepNames[s])).toEqual(['Choose a time', 'Sign in', 'Your details', 'Before you pay', 'Deposit']);
  });
});
