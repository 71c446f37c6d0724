import type { Ref, SelectHTMLAttributes } from 'react';
import { FieldFrame } from './field-frame';

type Props = SelectHTMLAttributes<HTMLSelectElement> & {
  label: string;
  error?: string;
  hint?: string;
  options: { value: string; label: string }[];
  ref?: Ref<HTMLSelectElement>;
};

/** A labelled drop-down whose hint and error are tied to it for screen readers. */
export function SelectField({ label, error, hint, options, id, className = '', ...rest }: Props) {
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error} className={className}>
      {(control) => (
        <select {...control} className="min-h-11 max-w-full rounded-lg border border-edge bg-white px-3 py-2 text-base aria-invalid:border-brick" {...rest}>
          {options.map((option) => (
            <option key={option.value} value={option.value}>
              {option.label}
            </option>
          ))}
        </select>
      )}
    </FieldFrame>
  );
}
