import { useSuspenseQuery } from '@tanstack/react-query';
import { Button } from '../../components/ui/button';
import { PageHeader } from '../../components/ui/page-header';
import { mailboxQueries } from '../../features/outbox/api/mailbox-queries';
import { MailList } from '../../features/outbox/components/mail-list';
import { salonQueries } from '../../features/salon/api/salon-queries';
import { queryClient } from '../../lib/query-client';

export async function loader() {
  await Promise.all([
    queryClient.ensureQueryData(mailboxQueries.messages()),
    queryClient.ensureQueryData(salonQueries.current()),
  ]);
  return null;
}

export function Component() {
  const mail = useSuspenseQuery(mailboxQueries.messages());
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  return (
    <div className="flex max-w-3xl flex-col gap-4">
      <PageHeader
        title="Outbox (demo)"
        subtitle="E-mails Dwell sent while running in demo mode. They were caught here and not delivered to anyone."
        action={
          <Button busy={mail.isFetching} onClick={() => void mail.refetch()}>
            Check for new e-mails
          </Button>
        }
      />
      <MailList messages={mail.data.messages} timeZone={salon.timeZone} />
    </div>
  );
}
