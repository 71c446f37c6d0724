import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { processingLimitIssues, type ProcessingLimits } from '@shared/rules/processing-limits';
import { AppError } from '@server/lib/app-error';

/**
 * Refuses a step plan that keeps a product on the hair longer than the salon's processing limits: 400 naming each
 * step (`stepPlan.sittings.<i>.steps.<k>`, under `prefix` when the plan sits inside a larger body) and its limit.
 * Services, quotes and the desk's per-booking plans are all held to it.
 */
export function assertWithinProcessingLimits(plan: StepPlan, limits: ProcessingLimits, prefix?: string): void {
  const issues = processingLimitIssues(plan, limits);
  const [first] = issues;
  if (!first) return;
  const fields = Object.fromEntries(issues.map((i) => [[...(prefix ? [prefix] : []), ...i.path].join('.'), i.message]));
  throw new AppError('VALIDATION_FAILED', 400, first.message, fields);
}
