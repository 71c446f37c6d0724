import type { InputHTMLAttributes, Ref } from 'react';
import { FieldFrame } from './field-frame';

type Props = InputHTMLAttributes<HTMLInputElement> & {
  label: string;
  error?: string;
  hint?: string;
  ref?: Ref<HTMLInputElement>;
};

/** A labelled input whose hint and error are tied to it for screen readers. */
export function TextField({ label, error, hint, id, className = '', ...rest }: Props) {
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error} className={className}>
      {(control) => <input {...control} className="min-h-11 rounded-lg border border-edge bg-white px-3 py-2 text-base aria-invalid:border-brick" {...rest} />}
    </FieldFrame>
  );
}
