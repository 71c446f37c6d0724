import { zodResolver } from '@hookform/resolvers/zod';
import { useRef } from 'react';
import { useFieldArray, useForm, useWatch } from 'react-hook-form';
import { WriteMixLogSchema, type ProductType, type WriteMixLog } from '@shared/schemas/mix-log.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { fieldError, showServerErrors } from '@client/lib/form-errors';
import { useWriteMixLog } from '../api/mix-log-queries';
import { partKindOptions, productTypeOptions } from '../product-type-labels';
import { DeveloperHelper } from './developer-helper';
import { DeveloperStrengthField } from './developer-strength-field';

type Props = { bookingId: string; sittingSeq: number; bowlNo: number; maxPercent: number };

// Empty number inputs mean "not given" (null), never 0.
const numberOrNull = (v: unknown) => (v === '' || v === null || v === undefined ? null : Number(v));

/** One bowl of a sitting (before it starts too), checked with the same schema as the server. */
export function BowlForm({ bookingId, sittingSeq, bowlNo, maxPercent }: Props) {
  const write = useWriteMixLog(bookingId);
  const defaults: WriteMixLog = {
    sittingSeq,
    bowlNo,
    productType: 'lightener',
    shadeNotes: '',
    developerPercent: 6,
    ratio: '1:2',
    grams: [
      { kind: 'lightener', part: '', grams: 30 },
      { kind: 'developer', part: '', grams: 60 },
    ],
    appliedTo: '',
    plannedMinutes: null,
    actualMinutes: null,
    heat: false,
    resultNotes: '',
  };
  const { register, control, handleSubmit, setError, reset, getValues, formState } = useForm<WriteMixLog>({
    resolver: zodResolver(WriteMixLogSchema),
    defaultValues: defaults,
  });
  const parts = useFieldArray({ control, name: 'grams' });
  const [developerPercent, ratio, weighed] = useWatch({ control, name: ['developerPercent', 'ratio', 'grams'] });
  const productType = useRef<ProductType>(defaults.productType);
  const e = formState.errors;

  // Changing the bowl's product carries its parts along (a lightener part becomes a toner part); developer and
  // other parts stay what they are.
  const onProductType = (next: ProductType) => {
    getValues('grams').forEach((p, i) => {
      if (p.kind === productType.current) parts.update(i, { ...p, kind: next });
    });
    productType.current = next;
  };

  const onSubmit = handleSubmit(async (values) => {
    try {
      await write.mutateAsync(values);
      reset({ ...defaults, bowlNo: bowlNo + 1 });
    } catch (error) {
      showServerErrors(error, setError, ['developerPercent', 'ratio', 'sittingSeq', 'bowlNo', 'grams', 'plannedMinutes', 'actualMinutes']);
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label={`Bowl for sitting ${sittingSeq}`}>
      {e.root?.server && <FormAlert>{e.root.server.message}</FormAlert>}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Bowl number" type="number" min={1} error={e.bowlNo?.message} {...register('bowlNo', { valueAsNumber: true })} />
        <SelectField
          label="Product type"
          options={productTypeOptions}
          error={e.productType?.message}
          {...register('productType', { onChange: (event) => onProductType(event.target.value as ProductType) })}
        />
        <TextField label="Shade or level notes" error={e.shadeNotes?.message} {...register('shadeNotes')} />
        <TextField label="Mix ratio" hint="Like 1:1.5 (product : developer)" error={e.ratio?.message} {...register('ratio')} />
        <TextField label="Where applied" error={e.appliedTo?.message} {...register('appliedTo')} />
      </div>
      <DeveloperStrengthField control={control} maxPercent={maxPercent} />
      <DeveloperHelper developerPercent={developerPercent} ratio={ratio} parts={weighed} />
      <fieldset className="flex flex-col gap-2">
        <legend className="font-bold">Grams of each part</legend>
        <p className="text-sm text-ink/80">
          Weigh each part as itself: the product, the developer, and anything else added. Totals and costs count each part as what it is.
        </p>
        {parts.fields.map((field, i) => (
          <div key={field.id} className="flex flex-wrap items-end gap-2">
            <SelectField label={`Part ${i + 1}`} options={partKindOptions} error={fieldError(e, `grams.${i}.kind`)} {...register(`grams.${i}.kind`)} />
            <TextField label="Notes (optional)" error={fieldError(e, `grams.${i}.part`)} {...register(`grams.${i}.part`)} />
            <TextField
              label="Grams"
              type="number"
              step="0.1"
              min={0}
              error={fieldError(e, `grams.${i}.grams`)}
              {...register(`grams.${i}.grams`, { valueAsNumber: true })}
            />
            {parts.fields.length > 1 && (
              <Button variant="quiet" onClick={() => parts.remove(i)}>
                Remove part {i + 1}
              </Button>
            )}
          </div>
        ))}
        {e.grams?.message && <p className="text-brick">{e.grams.message}</p>}
        <Button variant="secondary" className="self-start" onClick={() => parts.append({ kind: 'other', part: '', grams: 0 })}>
          Add a part
        </Button>
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-3">
        <TextField
          label="Planned minutes"
          type="number"
          min={0}
          error={e.plannedMinutes?.message}
          {...register('plannedMinutes', { setValueAs: numberOrNull })}
        />
        <TextField label="Actual minutes" type="number" min={0} error={e.actualMinutes?.message} {...register('actualMinutes', { setValueAs: numberOrNull })} />
        <label className="flex items-center gap-2 self-end font-bold">
          <input type="checkbox" className="size-5" {...register('heat')} /> Heat used
        </label>
      </div>
      <TextField label="Result notes" error={e.resultNotes?.message} {...register('resultNotes')} />
      <Button type="submit" busy={write.isPending} className="self-start">
        Save bowl
      </Button>
    </form>
  );
}
