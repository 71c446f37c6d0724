import { messagesApi } from '../../../../shared/api/messages.api';
import { apiQuery } from '../../../lib/api-client';

export const sentMessagesQueries = {
  list: () => ({ ...apiQuery(messagesApi.sendLog), staleTime: 0 }),
};
