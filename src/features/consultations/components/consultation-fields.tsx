import type { UseFormReturn } from 'react-hook-form';
import type { ColourHistory } from '@shared/schemas/consultation.schemas';
import { SelectField } from '@client/components/ui/select-field';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { TextField } from '@client/components/ui/text-field';
import { fieldError } from '@client/lib/form-errors';
import type { ConsultationFormInput, ConsultationFormValues } from '../consultation-form-schema';
import { densityOptions, elasticityOptions, historyLabels, lengthOptions, porosityOptions, strandOptions } from './consultation-labels';

type Props = { form: UseFormReturn<ConsultationFormInput, unknown, ConsultationFormValues> };

/** What the stylist finds at the consultation: levels, colour history, length, density, condition, strand test. */
export function ConsultationFields({ form }: Props) {
  const { register, formState } = form;
  const err = (path: string) => fieldError(formState.errors, `consultation.${path}`);
  const levelHint = '1 black … 10 lightest blonde';
  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap gap-3">
        <TextField
          label="Current level"
          hint={levelHint}
          type="number"
          inputMode="numeric"
          className="w-44"
          error={err('currentLevel')}
          {...register('consultation.currentLevel', { valueAsNumber: true })}
        />
        <TextField
          label="Target level"
          hint={levelHint}
          type="number"
          inputMode="numeric"
          className="w-44"
          error={err('targetLevel')}
          {...register('consultation.targetLevel', { valueAsNumber: true })}
        />
      </div>
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 font-bold">Colour history (tick all that apply)</legend>
        <div className="flex flex-wrap gap-x-5 gap-y-2">
          {(Object.keys(historyLabels) as (keyof ColourHistory)[]).map((key) => (
            <label key={key} className="inline-flex min-h-11 items-center gap-2">
              <input type="checkbox" className="size-5" {...register(`consultation.history.${key}`)} />
              {historyLabels[key]}
            </label>
          ))}
        </div>
      </fieldset>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <SelectField label="Length" options={lengthOptions} error={err('length')} {...register('consultation.length')} />
        <SelectField label="Density" options={densityOptions} error={err('density')} {...register('consultation.density')} />
        <SelectField label="Elasticity" options={elasticityOptions} error={err('elasticity')} {...register('consultation.elasticity')} />
        <SelectField label="Porosity" options={porosityOptions} error={err('porosity')} {...register('consultation.porosity')} />
      </div>
      <TextAreaField
        label="Condition notes"
        hint="Elasticity, porosity, breakage, scalp"
        error={err('conditionNotes')}
        {...register('consultation.conditionNotes')}
      />
      <div className="flex flex-wrap items-end gap-5">
        <SelectField label="Strand test" options={strandOptions} className="w-80" error={err('strandTest')} {...register('consultation.strandTest')} />
        <label className="inline-flex min-h-11 items-center gap-2">
          <input type="checkbox" className="size-5" {...register('consultation.wantsCut')} />
          Cut and finish at the end
        </label>
        <label className="inline-flex min-h-11 items-center gap-2">
          <input type="checkbox" className="size-5" {...register('consultation.vivid')} />A vivid shade (direct dye) on top, placed in sections
        </label>
      </div>
      <TextAreaField label="Other notes" hint="What the client wants, expectations, upkeep" error={err('notes')} {...register('consultation.notes')} />
    </div>
  );
}
