import { DateTime } from 'luxon';
import type { Control, FieldValues, Path } from 'react-hook-form';
import { ConvertedField } from '../../../components/ui/converted-field';

type Props<T extends FieldValues> = { control: Control<T>; name: Path<T>; label: string; zone: string; error?: string; optional?: boolean };

/** This minute in salon time, as the instant fields hold it: what a record form starts with. */
export const thisMinuteIn = (zone: string) => DateTime.now().setZone(zone).startOf('minute').toISO({ suppressMilliseconds: true })!;

/** A date and time typed in salon time and kept in the form as an ISO instant with its offset (what the API takes). */
export function InstantField<T extends FieldValues>({ zone, optional = false, ...props }: Props<T>) {
  return (
    <ConvertedField
      {...props}
      type="datetime-local"
      className="w-60"
      format={(value) => (typeof value === 'string' && value ? DateTime.fromISO(value, { zone }).toFormat("yyyy-LL-dd'T'HH:mm") : '')}
      parse={(text) => {
        if (text === '' && optional) return null;
        const moment = DateTime.fromISO(text, { zone });
        return moment.isValid ? moment.toISO({ suppressMilliseconds: true }) : text;
      }}
    />
  );
}
