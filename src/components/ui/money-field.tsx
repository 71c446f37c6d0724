import type { Control, FieldValues, Path } from 'react-hook-form';
import { ConvertedField } from './converted-field';
import { moneyInputText, parseMoney } from '@shared/money/money';

type Props<T extends FieldValues> = { control: Control<T>; name: Path<T>; label: string; currency: string; error?: string; hint?: string; className?: string };

/**
 * An amount typed in the currency's units ("260.00", "2500" yen) and kept in the form in minor units, as
 * the API has it; the decimals follow ISO 4217 (shared/money). Anything that is not an amount is kept as
 * undefined, so the form's schema says what is missing.
 */
export function MoneyField<T extends FieldValues>({ currency, label, className, ...rest }: Props<T>) {
  return (
    <ConvertedField
      {...rest}
      label={`${label} (${currency})`}
      inputMode="decimal"
      className={className}
      format={(value) => (typeof value === 'number' && Number.isFinite(value) ? moneyInputText(value, currency) : '')}
      parse={(text) => parseMoney(text, currency) ?? undefined}
    />
  );
}
