import { IdParamsSchema } from '../schemas/common.schemas';
import {
  BookingPaymentsSchema,
  CheckoutAnswerSchema,
  DepositDetailsSchema,
  DepositRequestBodySchema,
  DepositTakenBodySchema,
  DepositTokenParamsSchema,
  PayDepositRequestSchema,
  PaymentWebhookAnswerSchema,
  PaymentWebhookBodySchema,
  PublicDepositSchema,
  RefundBodySchema,
} from '../schemas/payments.schemas';
import { DESK, endpoint } from './endpoint';

/**
 * Money: the payment provider's signed webhook, a booking's deposit at the desk (where it stands, a request sent by
 * SMS or e-mail, taken in cash or on the card terminal), and a deposit request as its link opens it.
 */
export const paymentsApi = {
  // Outside /api: the provider posts without a session or a CSRF token; its Stripe-Signature header is checked
  // against the raw body.
  webhook: endpoint({
    method: 'post',
    path: '/webhooks/payments',
    access: 'public',
    summary: 'Payment provider webhook: a payment session completed or expired, a refund made (signed)',
    body: PaymentWebhookBodySchema,
    bodyType: 'raw',
    response: PaymentWebhookAnswerSchema,
  }),
  deposit: endpoint({
    method: 'get',
    path: '/api/bookings/:id/deposit',
    access: DESK,
    summary: "A booking's deposit: where it stands, each payment and refund, the requests sent",
    params: IdParamsSchema,
    response: DepositDetailsSchema,
  }),
  requestDeposit: endpoint({
    method: 'post',
    path: '/api/bookings/:id/deposit/requests',
    access: DESK,
    summary: 'Send the client a link to pay the deposit due, by SMS or e-mail',
    params: IdParamsSchema,
    body: DepositRequestBodySchema,
    response: DepositDetailsSchema,
    status: 201,
  }),
  depositTaken: endpoint({
    method: 'post',
    path: '/api/bookings/:id/deposit/taken',
    access: DESK,
    summary: 'Record the deposit due as taken at the desk (cash or the card terminal)',
    params: IdParamsSchema,
    body: DepositTakenBodySchema,
    response: DepositDetailsSchema,
  }),
  payments: endpoint({
    method: 'get',
    path: '/api/bookings/:id/payments',
    access: DESK,
    summary: "A booking's payments in (deposit, balance, tips) with what each can still refund, and its refunds",
    params: IdParamsSchema,
    response: BookingPaymentsSchema,
  }),
  refund: endpoint({
    method: 'post',
    path: '/api/bookings/:id/refunds',
    access: DESK,
    summary: 'Refund (part of) one of the booking’s payments with a reason: to the card through the provider, or in cash',
    params: IdParamsSchema,
    body: RefundBodySchema,
    response: BookingPaymentsSchema,
    status: 201,
  }),
  depositRequest: endpoint({
    method: 'get',
    path: '/api/public/deposit-requests/:token',
    access: 'public',
    summary: 'A deposit request as its link shows it',
    params: DepositTokenParamsSchema,
    response: PublicDepositSchema,
  }),
  payDepositRequest: endpoint({
    method: 'post',
    path: '/api/public/deposit-requests/:token/pay',
    access: 'public',
    summary: "Open (or reuse) the hosted payment page for the deposit due; the amount is the server's",
    params: DepositTokenParamsSchema,
    body: PayDepositRequestSchema,
    response: CheckoutAnswerSchema,
  }),
};
