import { messagesApi } from '@shared/api/messages.api';
import { apiQuery } from '@client/lib/api-client';

export const sentMessagesQueries = {
  list: () => ({ ...apiQuery(messagesApi.sendLog), staleTime: 0 }),
};
