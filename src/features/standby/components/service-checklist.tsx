import { useFormContext } from 'react-hook-form';
import type { ServiceSummary } from '@shared/schemas/service.schemas';
import type { CreateStandby } from '@shared/schemas/standby.schemas';
import { fieldError } from '@client/lib/form-errors';

type Props = { services: ServiceSummary[] };

/** The services the client would come in for (several may be ticked). */
export function ServiceChecklist({ services }: Props) {
  const { watch, setValue, formState } = useFormContext<CreateStandby>();
  const picked = watch('serviceIds');
  const error = fieldError(formState.errors, 'serviceIds');
  const toggle = (id: string, on: boolean) =>
    setValue('serviceIds', on ? [...picked, id] : picked.filter((x) => x !== id), { shouldValidate: formState.isSubmitted });
  return (
    <fieldset aria-invalid={error ? true : undefined} className="flex flex-col gap-1">
      <legend className="mb-1 font-bold">Services wanted</legend>
      <div className="grid gap-x-4 sm:grid-cols-2">
        {services.map((service) => (
          <label key={service.id} className="flex min-h-11 items-center gap-3">
            <input
              type="checkbox"
              checked={picked.includes(service.id)}
              onChange={(e) => toggle(service.id, e.target.checked)}
              className="size-5 accent-oxide"
            />
            {service.name}
          </label>
        ))}
      </div>
      {error && <p className="text-sm font-bold text-brick">{error}</p>}
    </fieldset>
  );
}
