import { flowStepNames, type FlowStep } from '../flow-steps';

type Props = { steps: readonly FlowStep[]; current: FlowStep };

/** Where the client is in the flow, in words (done / current) so it does not rely on looks. */
export function FlowProgress({ steps, current }: Props) {
  const index = steps.indexOf(current);
  return (
    <nav aria-label="Booking steps">
      <p className="text-sm font-bold text-ink/80 sm:sr-only">
        Step {index + 1} of {steps.length}: {flowStepNames[current]}
      </p>
      <ol className="hidden flex-wrap gap-x-4 gap-y-1 text-sm sm:flex">
        {steps.map((step, i) => (
          <li
            key={step}
            aria-current={i === index ? 'step' : undefined}
            className={i === index ? 'font-bold underline decoration-oxide decoration-2 underline-offset-4' : 'text-ink/80'}
          >
            <span aria-hidden="true">{i < index ? '✓ ' : `${i + 1}. `}</span>
            {flowStepNames[step]}
            {i < index && <span className="sr-only"> (done)</span>}
          </li>
        ))}
      </ol>
    </nav>
  );
}
