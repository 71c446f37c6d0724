import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { Button } from '@client/components/ui/button';
import { LoadingState } from '@client/components/ui/loading-state';
import { PageHeader } from '@client/components/ui/page-header';
import { SectionCard } from '@client/components/ui/section-card';
import { mailboxQueries } from '@client/features/outbox/api/mailbox-queries';
import { smsQueries } from '@client/features/outbox/api/sms-queries';
import { MailList } from '@client/features/outbox/components/mail-list';
import { SmsList } from '@client/features/outbox/components/sms-list';
import { sentMessagesQueries } from '@client/features/outbox/api/sent-messages-queries';
import { SentMessagesTable } from '@client/features/outbox/components/sent-messages-table';
import { InboundSmsForm } from '@client/features/outbox/components/inbound-sms-form';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { queryClient } from '@client/lib/query-client';

export async function loader() {
  await Promise.all([queryClient.ensureQueryData(mailboxQueries.messages()), queryClient.ensureQueryData(salonQueries.current())]);
  return null;
}

export function Component() {
  const mail = useSuspenseQuery(mailboxQueries.messages());
  const sms = useQuery(smsQueries.messages());
  const sent = useQuery(sentMessagesQueries.list());
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  return (
    <div className="flex flex-col gap-4">
      <PageHeader
        title="Outbox (demo)"
        subtitle="E-mails and text messages Dwell sent while running in demo mode. They were caught here and not delivered to anyone."
        action={
          <Button busy={mail.isFetching || sms.isFetching || sent.isFetching} onClick={() => void Promise.all([mail.refetch(), sms.refetch(), sent.refetch()])}>
            Check for new messages
          </Button>
        }
      />
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
        <SectionCard title="E-mails">
          <MailList messages={mail.data.messages} timeZone={salon.timeZone} />
        </SectionCard>
        <SectionCard title="SMS">
          {sms.isPending && <LoadingState label="Loading text messages…" />}
          {sms.isError && <p role="alert">The text messages could not be loaded: {sms.error.message}</p>}
          {sms.data && <SmsList messages={sms.data.messages} timeZone={salon.timeZone} />}
        </SectionCard>
      </div>
      <SectionCard title="A text from a client (demo)">
        <InboundSmsForm />
      </SectionCard>
      <SectionCard title="Sent messages">
        {sent.isPending && <LoadingState label="Loading the send log…" />}
        {sent.isError && <p role="alert">The send log could not be loaded: {sent.error.message}</p>}
        {sent.data && <SentMessagesTable messages={sent.data.messages} timeZone={salon.timeZone} />}
      </SectionCard>
    </div>
  );
}
