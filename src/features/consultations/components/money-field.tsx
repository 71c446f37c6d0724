import type { Control, FieldValues, Path } from 'react-hook-form';
import { ConvertedField } from '../../../components/ui/converted-field';

type Props<T extends FieldValues> = { control: Control<T>; name: Path<T>; label: string; error?: string };

/** An amount typed in whole currency units (e.g. 260.00) and kept in the form as cents, as the API wants. */
export function MoneyField<T extends FieldValues>(props: Props<T>) {
  return (
    <ConvertedField
      {...props}
      inputMode="decimal"
      className="w-40"
      format={(value) => (typeof value === 'number' ? (value / 100).toFixed(2) : '')}
      parse={(text) => {
        const amount = text.trim() === '' ? NaN : Number(text);
        return Number.isNaN(amount) ? undefined : Math.round(amount * 100);
      }}
    />
  );
}
