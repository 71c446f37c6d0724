import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { QuotePricesSchema, type QuotePrices } from '@shared/schemas/quote-prices.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { TextField } from '@client/components/ui/text-field';
import { fieldError, showServerErrors } from '@client/lib/form-errors';
import { toastDone } from '@client/lib/toast';
import { MoneyField } from '@client/components/ui/money-field';
import { CostedProductSchema } from '@shared/schemas/mix-log.schemas';
import { costedProductLabels } from '@client/features/mix-log';
import { useSaveQuotePrices } from '../api/quote-price-queries';

/** The hourly rate for correction work and the cost per gram of each generic product type and of developer. */
export function QuotePricesForm({ initial, currency }: { initial: QuotePrices; currency: string }) {
  const save = useSaveQuotePrices();
  const { register, control, handleSubmit, setError, formState } = useForm<QuotePrices>({ resolver: zodResolver(QuotePricesSchema), defaultValues: initial });
  const err = (path: string) => fieldError(formState.errors, path);
  const submit = handleSubmit((body) =>
    save.mutateAsync(body).then(
      () => toastDone('Prices saved. New quotes and mix-log estimates use them.'),
      (e) => showServerErrors(e, setError, ['correctionCentsPerHour']),
    ),
  );
  return (
    <form onSubmit={(e) => void submit(e)} noValidate aria-label="Quote prices" className="flex flex-col gap-4">
      {formState.errors.root?.server && <FormAlert>{formState.errors.root.server.message}</FormAlert>}
      <MoneyField
        control={control}
        name="correctionCentsPerHour"
        label="Hourly rate for colour and correction work"
        currency={currency}
        className="w-40"
        error={err('correctionCentsPerHour')}
      />
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 font-bold">Cost per gram as weighed into the bowl, in cents (leave empty if unknown)</legend>
        <p className="text-sm text-ink/80">
          A mix log counts each part as itself: the lightener grams of a bowl at the lightener cost, its developer grams at the developer cost.
        </p>
        <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
          {CostedProductSchema.options.map((value) => (
            <TextField
              key={value}
              label={costedProductLabels[value]}
              type="number"
              step="0.1"
              inputMode="decimal"
              error={err(`productCentsPerGram.${value}`)}
              {...register(`productCentsPerGram.${value}`, { setValueAs: (v: unknown) => (v === '' || v === undefined || v === null ? undefined : Number(v)) })}
            />
          ))}
        </div>
      </fieldset>
      <p className="text-sm text-ink/80">Estimates only: the licensed professional decides what each head needs.</p>
      <div>
        <Button type="submit" busy={formState.isSubmitting}>
          Save prices
        </Button>
      </div>
    </form>
  );
}
