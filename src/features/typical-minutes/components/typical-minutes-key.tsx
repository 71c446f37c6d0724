import type { TypicalMinutes } from '@shared/schemas/typical-minutes.schemas';

/** What the notes under the steps mean, once above them. */
export function TypicalMinutesKey({ answer }: { answer: TypicalMinutes }) {
  return (
    <p className="text-sm text-ink/80">
      Under each step: how long it really took over its last {answer.lastVisits} finished visits — typically the median, and the minutes 80% of visits stayed
      within (interpolated between neighbouring visits). Fewer than {answer.minVisits} visits are too few to say. “Use” copies a suggestion into the step;
      nothing changes until you save.
    </p>
  );
}
