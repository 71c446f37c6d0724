import type { StepNoteInput } from '@client/features/bookings';
import type { TypicalFigure, TypicalMinutes } from '@shared/schemas/typical-minutes.schemas';
import { typicalMinutesText, typicalWholeMinutes } from '@shared/format/typical-minutes';
import { Button } from '@client/components/ui/button';
import { typicalStepFor } from '../typical-step';

type Props = { answer: TypicalMinutes; step: StepNoteInput };

/** One figure in words with its "Use" button; the plan changes only when the button is pressed (and then saved). */
function FigureLine({ who, figure, answer, step }: Props & { who: string; figure: TypicalFigure }) {
  const whole = typicalWholeMinutes(figure);
  // A developing step takes the typical minutes as its least and the 80% mark as its most.
  const developing = step.kind === 'developing';
  const words = whole && (developing && whole.within !== whole.typical ? `${whole.typical}–${whole.within}` : String(whole.typical));
  return (
    <span className="flex flex-wrap items-center gap-x-2">
      <span>
        <span className="font-bold">{who}:</span> {typicalMinutesText(figure, answer.minVisits)}
      </span>
      {whole && words && (
        <Button
          variant="secondary"
          className="px-3 py-1 text-sm"
          aria-label={`Use ${words} min for ${step.name}${developing ? ' (least–most)' : ''}, ${who}`}
          onClick={() => step.apply(developing ? { minMinutes: whole.typical, maxMinutes: whole.within } : { minutes: whole.typical })}
        >
          Use {words}
        </Button>
      )}
    </span>
  );
}

/**
 * Beside a step's planned minutes: how long it really took, for the salon and per stylist (or for one stylist with
 * the salon's beside it), each as a suggestion with its own "Use" button.
 */
export function TypicalMinutesNote({ answer, step }: Props) {
  const found = typicalStepFor(answer, step);
  if (!found) return <p className="text-sm text-ink/80">Actual minutes: no finished visits of this step yet.</p>;
  const focus = answer.forStylistId === null ? undefined : found.stylists.find((s) => s.stylistId === answer.forStylistId);
  const headline =
    answer.forStylistId === null
      ? { who: 'Salon', figure: found.salon }
      : { who: focus?.name ?? 'This stylist', figure: focus ?? { visits: 0, medianMinutes: null, p80Minutes: null } };
  const others =
    answer.forStylistId === null
      ? found.stylists.map((s) => ({ key: s.stylistId, who: s.name, figure: s }))
      : [{ key: 'salon', who: 'Whole salon', figure: found.salon }];
  return (
    <div className="flex flex-col gap-1 text-sm" role="group" aria-label={`How long ${step.name} really took`}>
      <FigureLine answer={answer} step={step} {...headline} />
      {others.length > 0 && (
        <details>
          <summary className="cursor-pointer text-ink/80">{answer.forStylistId === null ? `By stylist (${others.length})` : 'The whole salon'}</summary>
          <ul className="mt-1 flex flex-col gap-1 pl-4">
            {others.map((o) => (
              <li key={o.key}>
                <FigureLine answer={answer} step={step} who={o.who} figure={o.figure} />
              </li>
            ))}
          </ul>
        </details>
      )}
    </div>
  );
}
