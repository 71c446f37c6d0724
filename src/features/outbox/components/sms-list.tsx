import type { CapturedSms } from '@shared/schemas/sms.schemas';
import { formatDate, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { usePhoneText } from '../../salon';
import { LinkedText } from './linked-text';

type Props = { messages: CapturedSms[]; timeZone: string };

/** Captured text messages, newest first, shown in full (they are short). */
export function SmsList({ messages, timeZone }: Props) {
  const phoneText = usePhoneText();
  if (messages.length === 0) return <p>No text messages sent yet.</p>;
  const newestFirst = [...messages].sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
  return (
    <ul className="flex flex-col gap-3">
      {newestFirst.map((sms) => (
        <li key={sms.id} className="rounded-xl bg-white px-4 py-3 ring-1 ring-ink/15">
          <p className="text-sm text-ink/80">
            to {phoneText(sms.to)} ·{' '}
            <span className="tabular">
              {formatDate(sms.receivedAt, formatFor(timeZone), { width: 'short' })}, {formatTime(sms.receivedAt, formatFor(timeZone))}
            </span>
          </p>
          <LinkedText text={sms.body} />
        </li>
      ))}
    </ul>
  );
}
