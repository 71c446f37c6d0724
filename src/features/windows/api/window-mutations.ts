import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { windowsApi } from '@shared/api/windows.api';
import type { FillWindowSchema, OfferWindowSchema } from '@shared/schemas/window.schemas';
import { callApi } from '@client/lib/api-client';
import { windowFilled, windowsChanged } from '@client/lib/cache-rules';

export function useFillWindow() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof FillWindowSchema>) => callApi(windowsApi.fill, { body }),
    // Booking a standby client closes their entry.
    onSuccess: (booking, body) => windowFilled(queryClient, booking, { standbyClosed: Boolean(body.standbyEntryId) }),
  });
}

/** Sends offers; nothing is booked until someone accepts, but the window cards show the offers that are out. */
export function useOfferWindow() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof OfferWindowSchema>) => callApi(windowsApi.offer, { body }),
    onSuccess: () => windowsChanged(queryClient),
  });
}
