import type { TypicalMinutes, TypicalStep } from '@shared/schemas/typical-minutes.schemas';

/** The figures of one step of a plan: the same sitting, label and time that label comes in the sitting. */
export function typicalStepFor(answer: TypicalMinutes, step: { sitting: number; label: string; occurrence: number }): TypicalStep | undefined {
  return answer.steps.find((s) => s.sitting === step.sitting && s.label === step.label && s.occurrence === step.occurrence);
}
