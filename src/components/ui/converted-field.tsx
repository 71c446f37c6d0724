import { useState, type InputHTMLAttributes } from 'react';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';
import { TextField } from './text-field';

type Props<T extends FieldValues> = Omit<InputHTMLAttributes<HTMLInputElement>, 'name' | 'value' | 'onChange'> & {
  control: Control<T>;
  name: Path<T>;
  label: string;
  error?: string;
  hint?: string;
  /** The form's value as the person reads it. */
  format: (value: unknown) => string;
  /** What the person typed, as the form (and the API) wants it. */
  parse: (text: string) => unknown;
};

/** A text input whose form value differs from what is typed (cents shown as units, instants shown in salon time). */
export function ConvertedField<T extends FieldValues>({ control, name, format, parse, ...rest }: Props<T>) {
  const { field } = useController({ control, name });
  const [text, setText] = useState(() => format(field.value));
  return (
    <TextField
      {...rest}
      name={field.name}
      ref={field.ref}
      value={text}
      onBlur={field.onBlur}
      onChange={(e) => {
        setText(e.target.value);
        field.onChange(parse(e.target.value));
      }}
    />
  );
}
