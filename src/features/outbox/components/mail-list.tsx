import type { CapturedMail } from '@shared/schemas/mailbox.schemas';
import { formatDate, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { LinkedText } from './linked-text';

type Props = { messages: CapturedMail[]; timeZone: string };

/** Captured e-mails, newest first; each opens to show its text. */
export function MailList({ messages, timeZone }: Props) {
  if (messages.length === 0) return <p>No e-mails sent yet.</p>;
  const newestFirst = [...messages].sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
  return (
    <ul className="flex flex-col gap-3">
      {newestFirst.map((mail) => (
        <li key={mail.id} className="rounded-xl bg-white ring-1 ring-ink/15">
          <details>
            <summary className="cursor-pointer px-4 py-3">
              <span className="font-bold">{mail.subject}</span>
              <span className="block text-sm text-ink/80">
                to {mail.to} ·{' '}
                <span className="tabular">
                  {formatDate(mail.receivedAt, formatFor(timeZone), { width: 'short' })}, {formatTime(mail.receivedAt, formatFor(timeZone))}
                </span>
              </span>
            </summary>
            <div className="border-t border-ink/10 px-4 py-3">
              <LinkedText text={mail.text} />
            </div>
          </details>
        </li>
      ))}
    </ul>
  );
}
