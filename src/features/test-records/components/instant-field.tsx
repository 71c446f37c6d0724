import { localDateTimeOf, localToInstant } from '@shared/time/salon-time';
import type { Control, FieldValues, Path } from 'react-hook-form';
import { ConvertedField } from '@client/components/ui/converted-field';

type Props<T extends FieldValues> = { control: Control<T>; name: Path<T>; label: string; zone: string; error?: string; optional?: boolean };

/** A date and time typed in salon time and kept in the form as an ISO instant with its offset (what the API takes). */
export function InstantField<T extends FieldValues>({ zone, optional = false, ...props }: Props<T>) {
  return (
    <ConvertedField
      {...props}
      type="datetime-local"
      className="w-60"
      format={(value) => (typeof value === 'string' && value ? localDateTimeOf(value, zone) : '')}
      parse={(text) => {
        if (text === '' && optional) return null;
        const [date = '', time = ''] = text.split('T');
        return localToInstant(date, time, zone) ?? text;
      }}
    />
  );
}
