import { useId } from 'react';
import type { HandsFreeWindowView } from '@shared/schemas/window.schemas';

type Props = { fits: HandsFreeWindowView['fits']; value: string; onChange: (serviceId: string) => void };

/** Which window fit to put in the window. */
export function WindowFitPicker({ fits, value, onChange }: Props) {
  const name = useId();
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 font-bold">Window fit</legend>
      {fits.map((fit) => (
        <label key={fit.serviceId} className="flex min-h-11 items-center gap-3 rounded-lg px-2 hover:bg-linen">
          <input
            type="radio"
            name={name}
            value={fit.serviceId}
            checked={value === fit.serviceId}
            onChange={() => onChange(fit.serviceId)}
            className="size-5 accent-oxide"
          />
          <span>
            {fit.name} <span className="text-ink/80 tabular">· {fit.minutes} min</span>
          </span>
        </label>
      ))}
    </fieldset>
  );
}
