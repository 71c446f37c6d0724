import type { Ref, TextareaHTMLAttributes } from 'react';
import { FieldFrame } from './field-frame';

type Props = TextareaHTMLAttributes<HTMLTextAreaElement> & {
  label: string;
  error?: string;
  hint?: string;
  ref?: Ref<HTMLTextAreaElement>;
};

/** A labelled multi-line input whose hint and error are tied to it for screen readers. */
export function TextAreaField({ label, error, hint, id, className = '', rows = 3, ...rest }: Props) {
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error} className={className}>
      {(control) => (
        <textarea {...control} rows={rows} className="rounded-lg border border-edge bg-white px-3 py-2 text-base aria-invalid:border-brick" {...rest} />
      )}
    </FieldFrame>
  );
}
