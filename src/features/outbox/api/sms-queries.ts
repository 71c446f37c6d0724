import { mailboxApi } from '@shared/api/mailbox.api';
import { apiQuery } from '@client/lib/api-client';

export const smsQueries = {
  messages: () => ({ ...apiQuery(mailboxApi.sms), staleTime: 0 }),
};
