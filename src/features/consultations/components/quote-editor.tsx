import { zodResolver } from '@hookform/resolvers/zod';
import { useSuspenseQuery } from '@tanstack/react-query';
import { FormProvider, useForm } from 'react-hook-form';
import { QuoteEditSchema, type QuoteEdit, type QuoteEditInput, type StrandOutcome } from '@shared/schemas/consultation.schemas';
import type { ServiceSummary } from '@shared/schemas/service.schemas';
import { withinProcessingLimits } from '@shared/rules/processing-limits';
import { STRAND_OVERRIDE_MIN, withStrandGate } from '@shared/quotes/strand-gate';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { Notice } from '@client/components/ui/notice';
import { SelectField } from '@client/components/ui/select-field';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { fieldError, showServerErrors } from '@client/lib/form-errors';
import { StepPlanEditor } from '@client/features/bookings';
import { typicalMinutesNotes, useTypicalMinutes } from '@client/features/typical-minutes';
import { salonQueries } from '@client/features/salon';
import { MoneyField } from '@client/components/ui/money-field';

type Props = {
  initial: QuoteEditInput;
  services: ServiceSummary[];
  /** The strand test the quote is held to: after a failed one, lightener or remover needs a written reason. */
  strandTest: StrandOutcome;
  submitLabel: string;
  /** The salon's ISO 4217 currency: the price and deposit are typed in its units. */
  currency: string;
  onSave: (quote: QuoteEdit) => Promise<unknown>;
};

/** Every part of a quote the stylist may change: the service it books as, steps, sittings, days apart, price, deposit. */
export function QuoteEditor({ initial, services, strandTest, submitLabel, currency, onSave }: Props) {
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  // The same checks as the server: the salon's processing limits, and the strand-test gate.
  const schema = QuoteEditSchema.superRefine(withinProcessingLimits(salon.processingLimits)).superRefine(withStrandGate(strandTest));
  const form = useForm<QuoteEditInput, unknown, QuoteEdit>({ resolver: zodResolver(schema), defaultValues: initial });
  const { register, control, handleSubmit, setError, formState, watch } = form;
  // The quoted steps' typical actual minutes in the service it books as: a stylist's own, the owner's per stylist.
  const typical = useTypicalMinutes(watch('serviceId'));
  const err = (path: string) => fieldError(formState.errors, path);
  const submit = handleSubmit((quote) =>
    onSave(quote).catch((error) => showServerErrors(error, setError, ['serviceId', 'priceCents', 'depositCents', 'notes', 'overrideReason'])),
  );
  const options = services.filter((s) => s.category === 'colour').map((s) => ({ value: s.id, label: s.name }));
  return (
    <FormProvider {...form}>
      <form onSubmit={(e) => void submit(e)} noValidate className="flex flex-col gap-4" aria-label="Quote">
        {formState.errors.root?.server && <FormAlert>{formState.errors.root.server.message}</FormAlert>}
        <SelectField label="Books as service" options={options} className="max-w-md" error={err('serviceId')} {...register('serviceId')} />
        <StepPlanEditor title="Steps and sittings of this quote" defaultOpen editSittings {...typicalMinutesNotes(typical)} />
        {strandTest === 'failed' && (
          <div className="flex flex-col gap-2">
            <Notice tone="danger" title="The strand test failed">
              Dwell plans no lightener and no colour remover for this hair. If you add them, write why it is safe to go ahead; the reason is kept with the quote
              and in the audit log.
            </Notice>
            <TextAreaField
              label="Reason to lighten or remove colour despite the failed strand test"
              hint={`Needed when the steps include lightener or colour remover (at least ${STRAND_OVERRIDE_MIN} characters).`}
              error={err('overrideReason')}
              {...register('overrideReason')}
            />
          </div>
        )}
        <div className="flex flex-wrap gap-3">
          <MoneyField control={control} name="priceCents" label="Price" currency={currency} className="w-40" error={err('priceCents')} />
          <MoneyField control={control} name="depositCents" label="Deposit" currency={currency} className="w-40" error={err('depositCents')} />
        </div>
        <TextAreaField label="Notes for the client" error={err('notes')} {...register('notes')} />
        <div>
          <Button type="submit" busy={formState.isSubmitting}>
            {submitLabel}
          </Button>
        </div>
      </form>
    </FormProvider>
  );
}
