import { queryOptions } from '@tanstack/react-query';
import { SentMessagesSchema, messagesPath } from '../../../../shared/schemas/messages.schemas';
import { apiGet } from '../../../lib/api-client';

export const sentMessagesQueries = {
  all: () => ['sent-messages'] as const,
  list: () =>
    queryOptions({
      queryKey: [...sentMessagesQueries.all(), 'list'] as const,
      queryFn: () => apiGet(messagesPath, SentMessagesSchema),
      staleTime: 0,
    }),
};
