import { useMutation, useQueryClient } from '@tanstack/react-query';
import { retailProductsApi } from '@shared/api/retail-products.api';
import type { RetailProductChange, RetailProductInput } from '@shared/schemas/retail-product.schemas';
import { apiQuery, callApi } from '@client/lib/api-client';
import { retailProductsChanged } from '@client/lib/cache-rules';

export const retailProductQueries = {
  list: () => apiQuery(retailProductsApi.list),
};

export function useAddRetailProduct() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: RetailProductInput) => callApi(retailProductsApi.add, { body }),
    onSuccess: () => retailProductsChanged(queryClient),
  });
}

/** A change, a retirement or a return to sale; a refusal re-reads the list too, since it may be a sale that moved the stock. */
export function useChangeRetailProduct() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: { id: string; body: RetailProductChange }) => callApi(retailProductsApi.change, { params: { id }, body }),
    onSettled: () => retailProductsChanged(queryClient),
  });
}

/** A product's stock as the (refreshed) list now has it. */
export function useListedStock() {
  const queryClient = useQueryClient();
  return (id: string) => queryClient.getQueryData(retailProductQueries.list().queryKey)?.products.find((p) => p.id === id)?.stock;
}
