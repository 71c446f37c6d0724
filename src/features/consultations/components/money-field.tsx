import { useState } from 'react';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';
import { TextField } from '../../../components/ui/text-field';

type Props<T extends FieldValues> = { control: Control<T>; name: Path<T>; label: string; error?: string };

/** An amount typed in whole currency units (e.g. 260.00) and kept in the form as cents, as the API wants. */
export function MoneyField<T extends FieldValues>({ control, name, label, error }: Props<T>) {
  const { field } = useController({ control, name });
  const [text, setText] = useState(() => (typeof field.value === 'number' ? (field.value / 100).toFixed(2) : ''));
  return (
    <TextField
      label={label}
      inputMode="decimal"
      className="w-40"
      error={error}
      name={field.name}
      ref={field.ref}
      value={text}
      onBlur={field.onBlur}
      onChange={(e) => {
        setText(e.target.value);
        const amount = e.target.value.trim() === '' ? NaN : Number(e.target.value);
        field.onChange(Number.isNaN(amount) ? undefined : Math.round(amount * 100));
      }}
    />
  );
}
