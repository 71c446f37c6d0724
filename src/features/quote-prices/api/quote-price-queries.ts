import { useMutation, useQueryClient } from '@tanstack/react-query';
import { quotePricesApi } from '@shared/api/quote-prices.api';
import type { QuotePrices } from '@shared/schemas/quote-prices.schemas';
import { apiQuery, callApi } from '@client/lib/api-client';

export const quotePriceQueries = {
  current: () => apiQuery(quotePricesApi.current),
};

export function useSaveQuotePrices() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: QuotePrices) => callApi(quotePricesApi.save, { body }),
    onSuccess: (saved) => queryClient.setQueryData(quotePriceQueries.current().queryKey, saved),
  });
}
