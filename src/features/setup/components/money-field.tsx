import { useState } from 'react';
import { useController, useFormContext } from 'react-hook-form';
import { TextField } from '../../../components/ui/text-field';
import { fieldError } from '../../../lib/form-errors';

type Props = { name: string; label: string; currency: string; hint?: string; className?: string };

/** An amount typed in the currency's units (e.g. 260.00) and kept in cents in the form, as the API has it. */
export function MoneyField({ name, label, currency, hint, className }: Props) {
  const { control, formState } = useFormContext();
  const { field } = useController({ control, name });
  const [text, setText] = useState(() => (typeof field.value === 'number' ? (field.value / 100).toFixed(2) : ''));
  return (
    <TextField
      label={`${label} (${currency})`}
      hint={hint}
      type="number"
      step="0.01"
      inputMode="decimal"
      className={className}
      error={fieldError(formState.errors, name)}
      value={text}
      onBlur={field.onBlur}
      onChange={(e) => {
        setText(e.target.value);
        field.onChange(e.target.value === '' ? Number.NaN : Math.round(Number(e.target.value) * 100));
      }}
    />
  );
}
