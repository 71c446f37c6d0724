import type { SentMessage } from '@shared/schemas/messages.schemas';
import { formatDate, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { usePhoneText } from '../../salon';
import { messageKindLabel } from '../message-kind-labels';

type Props = { messages: SentMessage[]; timeZone: string };

const STATUS_LABEL: Record<SentMessage['status'], string> = {
  queued: 'Queued',
  sending: 'Sending',
  sent: 'Sent',
  failed: 'Failed',
  dropped: 'Dropped',
};

/** The send log: what Dwell planned and what became of it; failed rows carry the reason for the desk. */
export function SentMessagesTable({ messages, timeZone }: Props) {
  const phoneText = usePhoneText();
  if (messages.length === 0) return <p>No messages planned yet.</p>;
  const at = (iso: string) => `${formatDate(iso, formatFor(timeZone), { width: 'short' })}, ${formatTime(iso, formatFor(timeZone))}`;
  return (
    // Focusable, so a keyboard can scroll the table sideways on a narrow screen.
    <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="Sent messages">
      <table className="w-full text-left text-sm">
        <thead className="text-ink/70">
          <tr>
            <th className="py-1 pr-3">Send at</th>
            <th className="py-1 pr-3">Message</th>
            <th className="py-1 pr-3">To</th>
            <th className="py-1 pr-3">Status</th>
            <th className="py-1 pr-3">Attempts</th>
            <th className="py-1">Last error</th>
          </tr>
        </thead>
        <tbody>
          {messages.map((m) => (
            <tr key={m.id} className="border-t border-ink/10 align-top">
              <td className="tabular py-1 pr-3">{at(m.sendAt)}</td>
              <td className="py-1 pr-3">
                {messageKindLabel(m.kind)} ({m.channel === 'sms' ? 'SMS' : 'e-mail'}){m.subject && <span className="block text-ink/70">{m.subject}</span>}
              </td>
              <td className="py-1 pr-3">{m.channel === 'sms' ? phoneText(m.toAddress) : m.toAddress}</td>
              <td className="py-1 pr-3" role={m.status === 'failed' ? 'alert' : undefined}>
                {STATUS_LABEL[m.status]}
                {m.sentAt ? ` ${formatTime(m.sentAt, formatFor(timeZone))}` : ''}
              </td>
              <td className="tabular py-1 pr-3">{m.attempts}</td>
              <td className="py-1 text-ink/80">{m.lastError ?? ''}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
