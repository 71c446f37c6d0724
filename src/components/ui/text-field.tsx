import { useId, type InputHTMLAttributes, type Ref } from 'react';

type Props = InputHTMLAttributes<HTMLInputElement> & {
  label: string;
  error?: string;
  hint?: string;
  ref?: Ref<HTMLInputElement>;
};

/** A labelled input whose hint and error are tied to it for screen readers. */
export function TextField({ label, error, hint, id, className = '', ...rest }: Props) {
  const autoId = useId();
  const inputId = id ?? autoId;
  const hintId = hint ? `${inputId}-hint` : undefined;
  const errorId = error ? `${inputId}-error` : undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={inputId} className="font-bold">
        {label}
      </label>
      {hint && (
        <p id={hintId} className="text-sm text-ink/80">
          {hint}
        </p>
      )}
      <input
        id={inputId}
        aria-invalid={error ? true : undefined}
        aria-describedby={[hintId, errorId].filter(Boolean).join(' ') || undefined}
        className="min-h-11 rounded-lg border border-ink/40 bg-white px-3 py-2 text-base aria-invalid:border-brick"
        {...rest}
      />
      {error && (
        <p id={errorId} className="text-sm font-bold text-brick">
          {error}
        </p>
      )}
    </div>
  );
}
