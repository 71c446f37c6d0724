import { zodResolver } from '@hookform/resolvers/zod';
import { FormProvider, useForm } from 'react-hook-form';
import { QuoteEditSchema, type QuoteEdit } from '../../../../shared/schemas/consultation.schemas';
import type { ServiceSummary } from '../../../../shared/schemas/service.schemas';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { SelectField } from '../../../components/ui/select-field';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { fieldError, showServerErrors } from '../../../lib/form-errors';
import { StepPlanEditor } from '../../booking-flow/components/step-plan-editor';
import { MoneyField } from './money-field';

type Props = {
  initial: QuoteEdit;
  services: ServiceSummary[];
  submitLabel: string;
  onSave: (quote: QuoteEdit) => Promise<unknown>;
};

/** Every part of a quote the stylist may change: the service it books as, steps, sittings, days apart, price, deposit. */
export function QuoteEditor({ initial, services, submitLabel, onSave }: Props) {
  const form = useForm<QuoteEdit>({ resolver: zodResolver(QuoteEditSchema), defaultValues: initial });
  const { register, control, handleSubmit, setError, formState } = form;
  const err = (path: string) => fieldError(formState.errors, path);
  const submit = handleSubmit((quote) =>
    onSave(quote).catch((error) => showServerErrors(error, setError, ['serviceId', 'priceCents', 'depositCents', 'notes'])),
  );
  const options = services.filter((s) => s.category === 'colour').map((s) => ({ value: s.id, label: s.name }));
  return (
    <FormProvider {...form}>
      <form onSubmit={(e) => void submit(e)} noValidate className="flex flex-col gap-4" aria-label="Quote">
        {formState.errors.root?.server && <FormAlert>{formState.errors.root.server.message}</FormAlert>}
        <SelectField label="Books as service" options={options} className="max-w-md" error={err('serviceId')} {...register('serviceId')} />
        <StepPlanEditor title="Steps and sittings of this quote" defaultOpen editSittings />
        <div className="flex flex-wrap gap-3">
          <MoneyField control={control} name="priceCents" label="Price" error={err('priceCents')} />
          <MoneyField control={control} name="depositCents" label="Deposit" error={err('depositCents')} />
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
