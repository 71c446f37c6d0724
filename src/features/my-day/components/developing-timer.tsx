import type { DateTime } from 'luxon';
import type { SittingView } from '@shared/schemas/booking-view.schemas';
import { developingTimer, type DevelopingPhase } from '../timer-state';

type Props = { step: SittingView['steps'][number]; now: DateTime };

// Each phase has its own words and mark; the border colour only adds to them.
const phases: Record<DevelopingPhase, { text: string; mark: string; look: string }> = {
  not_started: { text: 'Not started', mark: '○', look: 'border-ink/30' },
  processing: { text: 'Processing', mark: '◔', look: 'border-sage' },
  can_check: { text: 'Least time reached: can be checked', mark: '✓', look: 'border-amber' },
  must_come_off: { text: 'Most time reached: must come off now', mark: '!', look: 'border-brick' },
};

/** Minutes left on a developing step, and whether it can be checked or must come off. */
export function DevelopingTimer({ step, now }: Props) {
  const state = developingTimer(step, now);
  const phase = phases[state.phase];
  const range = step.minMinutes !== null && step.maxMinutes !== null ? ` (${step.minMinutes}–${step.maxMinutes} min)` : '';
  return (
    <div className={`flex flex-wrap items-center gap-x-4 gap-y-1 rounded-lg border-l-8 bg-white px-3 py-2 ring-1 ring-ink/10 ${phase.look}`}>
      <p className="text-2xl font-extrabold tabular">
        {state.minutesLeft} min left<span className="sr-only"> to the planned end</span>
      </p>
      <p role={state.phase === 'must_come_off' ? 'alert' : undefined} className="flex items-center gap-2 font-bold">
        <span aria-hidden="true" className={`inline-flex size-6 items-center justify-center rounded-full border-2 ${phase.look}`}>
          {phase.mark}
        </span>
        {phase.text}
      </p>
      <p className="text-sm text-ink/80 tabular">
        {state.minutesIn} min on{range}
      </p>
    </div>
  );
}
