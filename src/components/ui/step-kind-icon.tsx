import type { StepKind } from '@shared/schemas/common.schemas';

// Drawn for Dwell: a hand (stylist working), an hourglass (product processing), a droplet (basin).
const shapes: Record<StepKind, string> = {
  hands_on:
    'M7 12V6a1.5 1.5 0 0 1 3 0v5M10 11V4.5a1.5 1.5 0 0 1 3 0V11M13 11V5.5a1.5 1.5 0 0 1 3 0V12M16 12.5V9a1.5 1.5 0 0 1 3 0v5a7 7 0 0 1-7 7h-.5a6 6 0 0 1-5-2.7L3.8 15a1.5 1.5 0 0 1 2.4-1.8L7 14',
  developing: 'M6 3h12M6 21h12M7.5 3c0 5 4.5 6 4.5 9s-4.5 4-4.5 9M16.5 3c0 5-4.5 6-4.5 9s4.5 4 4.5 9',
  basin: 'M12 3s6 6.5 6 11a6 6 0 0 1-12 0c0-4.5 6-11 6-11z',
};

type Props = { kind: StepKind; className?: string };

/** Decorative: every use sits next to the step kind's name (visible or screen-reader only). */
export function StepKindIcon({ kind, className = 'size-4' }: Props) {
  return (
    <svg
      aria-hidden="true"
      viewBox="0 0 24 24"
      fill="none"
      stroke="currentColor"
      strokeWidth="2"
      strokeLinecap="round"
      strokeLinejoin="round"
      className={`shrink-0 ${className}`}
    >
      <path d={shapes[kind]} />
    </svg>
  );
}
