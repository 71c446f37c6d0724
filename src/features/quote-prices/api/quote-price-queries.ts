import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { QuotePricesSchema, type QuotePrices } from '../../../../shared/schemas/quote-prices.schemas';
import { apiGet, apiWrite } from '../../../lib/api-client';

export const quotePricesPath = '/api/owner/quote-prices';

export const quotePriceQueries = {
  current: () => queryOptions({ queryKey: ['quote-prices'] as const, queryFn: () => apiGet(quotePricesPath, QuotePricesSchema) }),
};

export function useSaveQuotePrices() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: QuotePrices) => apiWrite('PUT', quotePricesPath, body, QuotePricesSchema),
    onSuccess: (saved) => queryClient.setQueryData(quotePriceQueries.current().queryKey, saved),
  });
}
