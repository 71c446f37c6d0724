import type { StepKind } from '@shared/schemas/common.schemas';

/** The pattern class of each step kind (defined in src/styles/main.css). */
export const stepKindPattern: Record<StepKind, string> = {
  hands_on: 'step-hands-on',
  developing: 'step-developing',
  basin: 'step-basin',
};

type Props = { kind: StepKind };

/** A small sample of a step kind's pattern, for keys and lists. */
export function StepKindSwatch({ kind }: Props) {
  return <span aria-hidden="true" className={`inline-block h-4 w-6 shrink-0 rounded ${stepKindPattern[kind]}`} />;
}
