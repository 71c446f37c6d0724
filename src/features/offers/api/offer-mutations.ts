import { useMutation, useQueryClient } from '@tanstack/react-query';
import { offersApi } from '@shared/api/windows.api';
import { callApi } from '@client/lib/api-client';
import { offerRefused, offerTaken } from '@client/lib/cache-rules';

/** Take an offered time; the answer replaces the cached offer (status "taken"). */
export function useAcceptOffer(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => callApi(offersApi.accept, { params: { token } }),
    onSuccess: (offer) => offerTaken(queryClient, token, offer),
    // Gone or expired meanwhile: show the offer's real state.
    onError: () => offerRefused(queryClient, token),
  });
}
