import { useFieldArray, useFormContext } from 'react-hook-form';
import type { CreateStandby } from '@shared/schemas/standby.schemas';
import { Button } from '@client/components/ui/button';
import { TextField } from '@client/components/ui/text-field';
import { fieldError } from '@client/lib/form-errors';
import { weekdayLongNames, weekdayNames } from '../weekdays';

/** When the client can come at short notice: one row per set of weekdays and time range. */
export function AvailabilityRows() {
  const { control, register, formState, watch, setValue } = useFormContext<CreateStandby>();
  const rows = useFieldArray({ control, name: 'availability' });
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-1 font-bold">Can come at short notice</legend>
      {rows.fields.map((field, i) => (
        <div key={field.id} role="group" aria-label={`Times ${i + 1}`} className="flex flex-col gap-3 rounded-lg bg-linen p-3">
          <div className="flex flex-wrap gap-x-3 gap-y-1">
            {weekdayNames.map((day, d) => (
              <label key={day} className="flex min-h-11 items-center gap-2">
                <input
                  type="checkbox"
                  checked={(watch(`availability.${i}.weekdays`) ?? []).includes(d + 1)}
                  onChange={(event) => {
                    const now = watch(`availability.${i}.weekdays`) ?? [];
                    const next = event.target.checked ? [...now, d + 1] : now.filter((x) => x !== d + 1);
                    setValue(`availability.${i}.weekdays`, next, { shouldValidate: formState.isSubmitted });
                  }}
                  className="size-5 accent-oxide"
                />
                <span aria-hidden="true">{day}</span>
                <span className="sr-only">{weekdayLongNames[d]}</span>
              </label>
            ))}
          </div>
          {fieldError(formState.errors, `availability.${i}.weekdays`) && (
            <p className="text-sm font-bold text-brick">{fieldError(formState.errors, `availability.${i}.weekdays`)}</p>
          )}
          <div className="flex flex-wrap items-end gap-3">
            <TextField
              label="From"
              type="time"
              className="w-36"
              error={fieldError(formState.errors, `availability.${i}.from`)}
              {...register(`availability.${i}.from`)}
            />
            <TextField
              label="To"
              type="time"
              className="w-36"
              error={fieldError(formState.errors, `availability.${i}.to`)}
              {...register(`availability.${i}.to`)}
            />
            {rows.fields.length > 1 && (
              <Button variant="quiet" onClick={() => rows.remove(i)}>
                Remove these times
              </Button>
            )}
          </div>
        </div>
      ))}
      <div>
        <Button variant="secondary" disabled={rows.fields.length >= 7} onClick={() => rows.append({ weekdays: [], from: '09:00', to: '17:00' })}>
          Add other times
        </Button>
      </div>
    </fieldset>
  );
}
