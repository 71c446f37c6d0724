import { deskCheckoutApi } from '@shared/api/desk-checkout.api';
import { apiQuery } from '@client/lib/api-client';

export const deskCheckoutQueries = {
  /** A visit's checkout: read afresh, since the card part may be paid on the hosted page at any moment. */
  ofBooking: (bookingId: string) => ({ ...apiQuery(deskCheckoutApi.view, { params: { id: bookingId } }), staleTime: 0 }),
};
