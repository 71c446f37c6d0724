import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import type { ConsultationView } from '@shared/schemas/consultation.schemas';
import { formatDate } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { useSendQuote } from '../api/consultation-queries';

/** E-mail the saved quote to the client; they accept it on their own page. */
export function SendQuote({ view, timeZone }: { view: ConsultationView; timeZone: string }) {
  const send = useSendQuote(view.id);
  const q = view.quote;
  return (
    <div className="flex flex-col gap-2">
      {send.isError && <FormAlert>{send.error.message}</FormAlert>}
      <p>
        {q.status === 'draft' && 'Not sent to the client yet.'}
        {q.status === 'sent' &&
          q.sentAt &&
          `Sent to the client on ${formatDate(q.sentAt, formatFor(timeZone), { width: 'short' })}; waiting for them to accept it.`}
        {q.status === 'accepted' && q.acceptedAt && `Accepted by the client on ${formatDate(q.acceptedAt, formatFor(timeZone), { width: 'short' })}.`}
      </p>
      <div>
        <Button variant="secondary" busy={send.isPending} onClick={() => send.mutate()}>
          {q.status === 'draft' ? 'Send to the client by e-mail' : 'Send again'}
        </Button>
      </div>
    </div>
  );
}
