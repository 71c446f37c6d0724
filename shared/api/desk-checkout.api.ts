import { IdParamsSchema } from '../schemas/common.schemas';
import { DeskCheckoutBodySchema, DeskCheckoutSchema } from '../schemas/desk-checkout.schemas';
import { DESK, endpoint } from './endpoint';

/** Checkout at the desk when a visit ends: what it can charge, and the checkout made and paid (card, cash or split). */
export const deskCheckoutApi = {
  view: endpoint({
    method: 'get',
    path: '/api/bookings/:id/checkout',
    access: DESK,
    summary: "A visit's checkout: its services, the stylists who share a tip, the deposit paid, products, and the checkout once made",
    params: IdParamsSchema,
    response: DeskCheckoutSchema,
  }),
  checkOut: endpoint({
    method: 'post',
    path: '/api/bookings/:id/checkout',
    access: DESK,
    summary: 'Check the visit out: the server works out the receipt, takes products from stock, records cash, opens the hosted page for a card part',
    params: IdParamsSchema,
    body: DeskCheckoutBodySchema,
    response: DeskCheckoutSchema,
    status: 201,
  }),
  restInCash: endpoint({
    method: 'post',
    path: '/api/bookings/:id/checkout/cash',
    access: DESK,
    summary:
      "The checkout's unpaid card part taken in cash instead: the hosted page closed, the rest of the balance and the tip recorded as cash, the visit checked out (409 when the card payment already went through)",
    params: IdParamsSchema,
    response: DeskCheckoutSchema,
  }),
};
