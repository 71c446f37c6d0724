import type { UseFormRegister } from 'react-hook-form';
import type { HairHistory } from '@shared/schemas/hair-history.schemas';
import { TextField } from '@client/components/ui/text-field';
import { answerLabels } from './hair-history-labels';

type AnswerName = 'boxDye' | 'plantDyes' | 'vividDyes' | 'previousReaction';
type Props = {
  name: AnswerName;
  question: string;
  detailsLabel: string;
  register: UseFormRegister<HairHistory>;
  detailsError?: string;
  answerError?: string;
};

/** One question answered No / Yes / Not sure, with a details box; radios share a legend for screen readers. */
export function AnswerFieldset({ name, question, detailsLabel, register, detailsError, answerError }: Props) {
  const errorId = `${name}-answer-error`;
  return (
    <fieldset className="flex flex-col gap-2" aria-describedby={answerError ? errorId : undefined}>
      <legend className="mb-1 font-bold">{question}</legend>
      {answerError && (
        <p id={errorId} className="text-sm font-bold text-brick">
          {answerError}
        </p>
      )}
      <div className="flex flex-wrap gap-x-5 gap-y-2">
        {(Object.keys(answerLabels) as (keyof typeof answerLabels)[]).map((value) => (
          <label key={value} className="inline-flex min-h-11 items-center gap-2">
            <input type="radio" value={value} className="size-5 accent-oxide" {...register(`${name}.answer`)} />
            {answerLabels[value]}
          </label>
        ))}
      </div>
      <TextField label={detailsLabel} error={detailsError} {...register(`${name}.details`)} />
    </fieldset>
  );
}
