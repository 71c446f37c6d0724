import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { FollowUpRuleBodySchema, type FollowUpRule } from '@shared/schemas/follow-up-rules.schemas';
import type { ServiceSummary } from '@shared/schemas/service.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { SelectField } from '@client/components/ui/select-field';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { TextField } from '@client/components/ui/text-field';
import { showServerErrors } from '@client/lib/form-errors';
import { useSaveFollowUpRule } from '../api/follow-up-queries';
import { FollowUpPreview } from './follow-up-preview';
import { FollowUpTimingFields } from './follow-up-timing-fields';
import { readFollowUpTiming } from '@shared/messages/follow-up-timing';

type Input = z.input<typeof FollowUpRuleBodySchema>;
type Values = z.output<typeof FollowUpRuleBodySchema>;
type Props = { rule: FollowUpRule | null; services: ServiceSummary[]; timeZone: string; onDone: () => void };

/** Adds or edits one rule, with a live preview of when it would send. */
export function FollowUpRuleForm({ rule, services, timeZone, onDone }: Props) {
  const save = useSaveFollowUpRule(rule?.id ?? null);
  const colour = services.filter((s) => s.category === 'colour');
  const options = (colour.length > 0 ? colour : services).map((s) => ({ value: s.id, label: s.name }));
  const { register, control, handleSubmit, setError, setValue, formState } = useForm<Input, unknown, Values>({
    resolver: zodResolver(FollowUpRuleBodySchema),
    defaultValues: rule
      ? { serviceId: rule.serviceId, title: rule.title, text: rule.text, rrule: rule.rrule }
      : { serviceId: options[0]?.value ?? '', title: '', text: '', rrule: 'FREQ=WEEKLY;INTERVAL=6;COUNT=1' },
  });
  const { errors } = formState;
  const rrule = useWatch({ control, name: 'rrule' });
  const submit = handleSubmit((body) =>
    save.mutateAsync(body).then(onDone, (error) => showServerErrors(error, setError, ['serviceId', 'title', 'text', 'rrule'])),
  );
  return (
    <form onSubmit={(e) => void submit(e)} noValidate aria-label={rule ? 'Edit follow-up rule' : 'New follow-up rule'} className="flex flex-col gap-3">
      {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
      <SelectField label="After this service" options={options} error={errors.serviceId?.message} {...register('serviceId')} />
      <TextField label="Title" placeholder="Toner refresh" error={errors.title?.message} {...register('title')} />
      <TextAreaField
        label="Message"
        hint="Sent as written, with the salon's name; only to clients who said yes to suggestions."
        error={errors.text?.message}
        {...register('text')}
      />
      <FollowUpTimingFields rrule={rrule ?? ''} onChange={(next) => setValue('rrule', next, { shouldDirty: true, shouldValidate: formState.isSubmitted })} />
      <details open={Boolean(errors.rrule) || readFollowUpTiming(rrule ?? '') === null} className="text-sm">
        <summary className="min-h-11 cursor-pointer py-2 font-bold">For experts: the timing as calendar text</summary>
        <TextField
          label="Calendar rule"
          hint="Written by the fields above. For other patterns, an iCalendar RRULE (RFC 5545): FREQ=WEEKLY;INTERVAL=6;COUNT=1 is once, six weeks later."
          error={errors.rrule?.message}
          {...register('rrule')}
        />
      </details>
      <FollowUpPreview rrule={rrule ?? ''} timeZone={timeZone} now={new Date()} />
      <div className="flex gap-3">
        <Button type="submit" busy={save.isPending}>
          {rule ? 'Save rule' : 'Add rule'}
        </Button>
        {rule && (
          <Button type="button" variant="secondary" onClick={onDone}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}
