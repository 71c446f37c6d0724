import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useForm, useWatch } from 'react-hook-form';
import { HairHistorySchema, emptyHairHistory, type HairHistory } from '@shared/schemas/hair-history.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { LoadingState } from '@client/components/ui/loading-state';
import { SelectField } from '@client/components/ui/select-field';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { TextField } from '@client/components/ui/text-field';
import { fieldError, showServerErrors } from '@client/lib/form-errors';
import { useUnsavedChangesGuard } from '@client/lib/use-unsaved-changes-guard';
import { useSaveHairHistory } from '../api/hair-history-mutations';
import type { RecordOwner } from '@client/lib/record-owner';
import { hairHistoryQueries } from '../api/hair-history-queries';
import { AnswerFieldset } from './answer-fieldset';
import { answerQuestions, methodLabels, structuralLabels } from './hair-history-labels';
import { PastServicesFields } from './past-services-fields';
import { ReactionCaution } from './reaction-caution';

type Props = {
  onSaved?: () => void;
  owner?: RecordOwner;
  /** The one action's words; in the booking flow it saves and moves on ("Save and continue"). */
  submitLabel?: string;
};

/**
 * The hair-history form; by default the signed-in client's own. Loads saved answers first. Leaving with
 * unsaved answers asks first: these are safety answers, and typing them twice is how they get skipped.
 */
export function HairHistoryForm({ onSaved, owner = 'me', submitLabel = 'Save hair history' }: Props) {
  const history = useQuery(hairHistoryQueries.detail(owner));
  if (history.isPending) return <LoadingState label="Loading your hair history…" />;
  if (history.isError) return <FormAlert>{history.error.message}</FormAlert>;
  return (
    <Fields
      initial={history.data.answers ?? emptyHairHistory()}
      saved={history.data.answers !== null}
      owner={owner}
      onSaved={onSaved}
      submitLabel={submitLabel}
    />
  );
}

const methodOptions = Object.entries(methodLabels).map(([value, label]) => ({ value, label }));

function Fields({
  initial,
  saved,
  owner,
  onSaved,
  submitLabel,
}: {
  initial: HairHistory;
  saved: boolean;
  owner: RecordOwner;
  onSaved?: () => void;
  submitLabel: string;
}) {
  const save = useSaveHairHistory(owner);
  const { register, control, handleSubmit, setError, reset, formState } = useForm<HairHistory>({
    resolver: zodResolver(HairHistorySchema),
    defaultValues: initial,
  });
  const { errors } = formState;
  const reaction = useWatch({ control, name: 'previousReaction.answer' });
  useUnsavedChangesGuard(formState.isDirty && !formState.isSubmitting);
  const submit = handleSubmit((answers) =>
    // Nothing changed since the last save: there is nothing to store, only to move on. A form never saved is saved,
    // so its required answers (the reaction question) are always given once.
    saved && !formState.isDirty
      ? onSaved?.()
      : save.mutateAsync(answers).then(
          (saved) => {
            reset(saved.answers ?? answers); // the saved answers become the new baseline, so the form is clean again
            onSaved?.();
          },
          (error) => showServerErrors(error, setError, ['previousReaction.details', 'medicalNotes']),
        ),
  );
  const err = (path: string) => fieldError(errors, path);
  return (
    <form onSubmit={(e) => void submit(e)} noValidate className="flex flex-col gap-6" aria-label="Hair history">
      {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField
          label="Your hair colour now"
          placeholder="e.g. Faded copper over dark brown roots"
          error={err('currentColour')}
          {...register('currentColour')}
        />
        <SelectField label="How it got that colour" options={methodOptions} error={err('currentColourMethod')} {...register('currentColourMethod')} />
      </div>
      <PastServicesFields control={control} register={register} errors={errors} />
      {answerQuestions.map((q) => (
        <AnswerFieldset
          key={q.name}
          name={q.name}
          question={q.question}
          detailsLabel={q.details}
          register={register}
          detailsError={err(`${q.name}.details`)}
          answerError={err(`${q.name}.answer`)}
        />
      ))}
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 font-bold">Relaxers, perms or keratin treatments you have had</legend>
        <div className="flex flex-wrap gap-x-5 gap-y-2">
          {(Object.keys(structuralLabels) as (keyof typeof structuralLabels)[]).map((key) => (
            <label key={key} className="inline-flex min-h-11 items-center gap-2">
              <input type="checkbox" className="size-5 accent-oxide" {...register(`structural.${key}`)} />
              {structuralLabels[key]}
            </label>
          ))}
        </div>
        <TextField label="Which, and when" error={err('structural.details')} {...register('structural.details')} />
      </fieldset>
      <div className="flex flex-col gap-2">
        <AnswerFieldset
          name="previousReaction"
          question="Have you ever reacted to hair colour (itching, burning, swelling, rash)?"
          detailsLabel="What happened, and when"
          register={register}
          detailsError={err('previousReaction.details')}
          answerError={err('previousReaction.answer')}
        />
        <ReactionCaution emphasised={reaction === 'yes'} />
      </div>
      <TextAreaField
        label="Scalp conditions"
        hint="e.g. psoriasis, eczema, sensitivity, cuts"
        error={err('scalpConditions')}
        {...register('scalpConditions')}
      />
      <TextAreaField
        label="Medical notes (private)"
        hint="Allergies, medicines, pregnancy or anything else the colourist should know. Only you and the salon’s team can read this."
        error={err('medicalNotes')}
        {...register('medicalNotes')}
      />
      {save.isSuccess && !formState.isDirty && <FormAlert tone="success">Hair history saved.</FormAlert>}
      <div>
        <Button type="submit" busy={save.isPending}>
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}
