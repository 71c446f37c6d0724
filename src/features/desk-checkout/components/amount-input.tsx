import { useState } from 'react';
import { TextField } from '@client/components/ui/text-field';

type Props = { label: string; initial: string; parse: (text: string) => number | null; onValue: (value: number | null) => void; error?: string; hint?: string };

/** A typed amount or percentage kept as its text while typed, handed on as whole minor units (null: not a number). */
export function AmountInput({ label, initial, parse, onValue, error, hint }: Props) {
  const [text, setText] = useState(initial);
  return (
    <TextField
      label={label}
      inputMode="decimal"
      value={text}
      error={error}
      hint={hint}
      onChange={(e) => {
        setText(e.target.value);
        onValue(e.target.value.trim() === '' ? 0 : parse(e.target.value));
      }}
    />
  );
}
