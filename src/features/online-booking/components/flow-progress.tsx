import { FLOW_STEPS, flowStepNames, type FlowStep } from '../flow-steps';

type Props = { current: FlowStep };

/** Where the client is in the flow, in words (done / current) so it does not rely on looks. */
export function FlowProgress({ current }: Props) {
  const index = FLOW_STEPS.indexOf(current);
  return (
    <nav aria-label="Booking steps">
      <p className="text-sm font-bold text-ink/80 sm:sr-only">
        Step {index + 1} of {FLOW_STEPS.length}
      </p>
      <ol className="hidden flex-wrap gap-x-4 gap-y-1 text-sm sm:flex">
        {FLOW_STEPS.map((step, i) => (
          <li key={step} aria-current={i === index ? 'step' : undefined} className={i === index ? 'font-bold underline decoration-oxide decoration-2 underline-offset-4' : 'text-ink/80'}>
            <span aria-hidden="true">{i < index ? '✓ ' : `${i + 1}. `}</span>
            {flowStepNames[step]}
            {i < index && <span className="sr-only"> (done)</span>}
          </li>
        ))}
      </ol>
    </nav>
  );
}
