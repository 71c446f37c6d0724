import type { DateTime } from 'luxon';
import { useTimerAlerts } from '@client/features/day-of-service';
import { developingTimer, dueAlerts, type DevelopingPhase, type DevelopingTiming } from '../timer-state';

type Props = {
  timing: DevelopingTiming;
  now: DateTime;
  /** Names the step for its alerts (chime and notice), e.g. "Jordan Avery: Lightener lifts"; the key raises each once. */
  alert: { key: string; label: string };
};

// Each phase has its own words and mark; the border colour only adds to them.
const phases: Record<DevelopingPhase, { text: string; mark: string; look: string }> = {
  not_started: { text: 'Not started', mark: '○', look: 'border-ink/30' },
  processing: { text: 'Processing', mark: '◔', look: 'border-sage' },
  can_check: { text: 'Least time reached: can be checked', mark: '✓', look: 'border-amber' },
  must_come_off: { text: 'Most time reached: must come off now', mark: '!', look: 'border-brick' },
  over_limit: { text: 'Over the processing limit: rinse now', mark: '!!', look: 'border-brick bg-brick/10' },
};

/**
 * Minutes on a developing step, counted from the real moment product went on once it is tapped, against its least and
 * most minutes and the product's processing limit; raises the alerts as each moment comes.
 */
export function DevelopingTimer({ timing, now, alert }: Props) {
  const state = developingTimer(timing, now);
  const phase = phases[state.phase];
  useTimerAlerts(alert.key, alert.label, dueAlerts(timing, now), now);
  const range = timing.least === timing.most ? `${timing.most} min` : `${timing.least}–${timing.most} min`;
  const loud = state.phase === 'must_come_off' || state.phase === 'over_limit';
  return (
    <div className={`flex flex-wrap items-center gap-x-4 gap-y-1 rounded-lg border-l-8 bg-white px-3 py-2 ring-1 ring-ink/10 ${phase.look}`}>
      <p className="text-2xl font-extrabold tabular">
        {state.minutesIn} min on<span className="sr-only"> this developing step</span>
      </p>
      <p role={loud ? 'alert' : undefined} className="flex items-center gap-2 font-bold">
        <span aria-hidden="true" className={`inline-flex size-7 items-center justify-center rounded-full border-2 ${phase.look}`}>
          {phase.mark}
        </span>
        {phase.text}
      </p>
      <p className="text-sm text-ink/80 tabular">
        {range} · {state.minutesLeft} min left of the plan · {timing.fromActual ? 'from the real start' : 'from the planned start'}
        {timing.limit !== null && ` · on the hair ${state.minutesOnHair} of ${timing.limit} min limit`}
      </p>
    </div>
  );
}
