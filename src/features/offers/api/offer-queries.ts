import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { OfferViewSchema } from '../../../../shared/schemas/window.schemas';
import { apiGet, apiWrite } from '../../../lib/api-client';

export const offerQueries = {
  all: () => ['offers'] as const,
  byToken: (token: string) =>
    queryOptions({
      queryKey: [...offerQueries.all(), token] as const,
      queryFn: () => apiGet(apiPaths.offer(token), OfferViewSchema),
      staleTime: 0,
    }),
};

/** Take an offered time; the answer replaces the cached offer (status "taken"). */
export function useAcceptOffer(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiWrite('POST', apiPaths.acceptOffer(token), {}, OfferViewSchema),
    onSuccess: (offer) => queryClient.setQueryData(offerQueries.byToken(token).queryKey, offer),
    // Gone or expired meanwhile: show the offer's real state.
    onError: () => queryClient.invalidateQueries({ queryKey: offerQueries.byToken(token).queryKey }),
  });
}
