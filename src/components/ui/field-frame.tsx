import { useId, type ReactNode } from 'react';

type ControlProps = { id: string; 'aria-invalid'?: true; 'aria-describedby'?: string };
type Props = {
  id?: string;
  label: string;
  hint?: string;
  error?: string;
  className?: string;
  /** Draws the control with the ids that tie it to its label, hint and error. */
  children: (control: ControlProps) => ReactNode;
};

/** The label, hint and error around one form control, tied to it for screen readers. */
export function FieldFrame({ id, label, hint, error, className = '', children }: Props) {
  const autoId = useId();
  const controlId = id ?? autoId;
  const hintId = hint ? `${controlId}-hint` : undefined;
  const errorId = error ? `${controlId}-error` : undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={controlId} className="font-bold">
        {label}
      </label>
      {hint && (
        <p id={hintId} className="text-sm text-ink/80">
          {hint}
        </p>
      )}
      {children({
        id: controlId,
        'aria-invalid': error ? true : undefined,
        'aria-describedby': [hintId, errorId].filter(Boolean).join(' ') || undefined,
      })}
      {error && (
        <p id={errorId} className="text-sm font-bold text-brick">
          {error}
        </p>
      )}
    </div>
  );
}
