import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { SmsOutboxSchema } from '../../../../shared/schemas/sms.schemas';
import { apiGet } from '../../../lib/api-client';

export const smsQueries = {
  all: () => ['sms-outbox'] as const,
  messages: () =>
    queryOptions({
      queryKey: [...smsQueries.all(), 'messages'] as const,
      queryFn: () => apiGet(apiPaths.devSms, SmsOutboxSchema),
      staleTime: 0,
    }),
};
