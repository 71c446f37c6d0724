import type { UseFormRegister } from 'react-hook-form';
import type { MessageChannelChoice } from '@shared/schemas/contact.schemas';
import { formatDate } from '@shared/format/date-time';
import { deviceFormat } from '@client/lib/time';

type PreferenceValues = { messageChannel: MessageChannelChoice; marketingOptIn: boolean };
type Props<T extends PreferenceValues> = {
  /** The register of any form that has the two preference fields. */
  register: UseFormRegister<T>;
  /** Set when the client replied STOP to a text. */
  smsStoppedAt: string | null;
  you: boolean;
};

const channels: { value: MessageChannelChoice; label: string }[] = [
  { value: 'both', label: 'Text and e-mail' },
  { value: 'sms', label: 'Text (SMS) only' },
  { value: 'email', label: 'E-mail only' },
];

/** Where service messages go, and the separate yes/no for marketing suggestions. */
export function MessagePreferenceFields<T extends PreferenceValues>({ register: registerAny, smsStoppedAt, you }: Props<T>) {
  // The two field names exist on every T; react-hook-form's path types cannot see that through the generic.
  const register = registerAny as unknown as UseFormRegister<PreferenceValues>;
  return (
    <>
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 font-bold">Confirmations and reminders by</legend>
        <div className="flex flex-wrap gap-x-5 gap-y-2">
          {channels.map((c) => (
            <label key={c.value} className="inline-flex min-h-11 items-center gap-2">
              <input type="radio" value={c.value} className="size-5 accent-oxide" {...register('messageChannel')} />
              {c.label}
            </label>
          ))}
        </div>
        {smsStoppedAt && (
          <p className="text-sm">
            Texts are off: {you ? 'you' : 'the client'} replied STOP on {formatDate(smsStoppedAt, deviceFormat(), { width: 'short' })}. A reply of START turns
            them back on{you ? '' : ', as does saving a new mobile number'}.
          </p>
        )}
      </fieldset>
      <label className="inline-flex min-h-11 items-center gap-2">
        <input type="checkbox" className="size-5 accent-oxide" {...register('marketingOptIn')} />
        {you ? 'Send me' : 'Client agrees to'} occasional suggestions, e.g. when a toner refresh is due (separate from booking messages)
      </label>
    </>
  );
}
