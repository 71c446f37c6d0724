import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { MailboxSchema } from '../../../../shared/schemas/mailbox.schemas';
import { apiGet } from '../../../lib/api-client';

export const mailboxQueries = {
  all: () => ['mailbox'] as const,
  messages: () =>
    queryOptions({
      queryKey: [...mailboxQueries.all(), 'messages'] as const,
      queryFn: () => apiGet(apiPaths.devMailbox, MailboxSchema),
      // New mail arrives without anyone on this page doing anything.
      staleTime: 0,
    }),
};
