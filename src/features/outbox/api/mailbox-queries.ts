import { mailboxApi } from '@shared/api/mailbox.api';
import { apiQuery } from '@client/lib/api-client';

export const mailboxQueries = {
  // New mail arrives without anyone on this page doing anything.
  messages: () => ({ ...apiQuery(mailboxApi.mail), staleTime: 0 }),
};
