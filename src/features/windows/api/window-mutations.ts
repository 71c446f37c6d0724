import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiPaths } from '../../../../shared/api/api-paths';
import { BookingViewSchema } from '../../../../shared/schemas/booking-view.schemas';
import type { FillWindowSchema, OfferWindowSchema } from '../../../../shared/schemas/window.schemas';
import { apiWrite } from '../../../lib/api-client';
import { bookingChanged } from '../../../lib/cache-rules';
import { standbyQueries } from '../../standby/api/standby-queries';
import { windowQueries } from './window-queries';

const OfferResultSchema = z.object({ offers: z.number().int() });

export function useFillWindow() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof FillWindowSchema>) => apiWrite('POST', apiPaths.fillWindow, body, BookingViewSchema),
    onSuccess: (booking, body) =>
      Promise.all([
        bookingChanged(queryClient, booking),
        // Booking a standby client closes their entry.
        body.standbyEntryId && queryClient.invalidateQueries({ queryKey: standbyQueries.list().queryKey }),
      ]),
  });
}

/** Sends offers; nothing is booked until someone accepts, but the window cards show the offers that are out. */
export function useOfferWindow() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof OfferWindowSchema>) => apiWrite('POST', apiPaths.offerWindow, body, OfferResultSchema),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: windowQueries.all() }),
  });
}
