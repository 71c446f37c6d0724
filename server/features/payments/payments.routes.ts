import express from 'express';
import { deskCheckoutApi } from '@shared/api/desk-checkout.api';
import { paymentsApi } from '@shared/api/payments.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { receivePaymentWebhook } from './payment-webhook.service';
import { depositDetails, markDepositTaken, requestDeposit } from './desk-deposits.service';
import { payDepositRequest, viewDepositRequest } from './deposit-link.service';
import { bookingMoney, refundPayment } from './desk-refunds.service';
import { checkOutVisit, deskCheckoutView } from './desk-checkout.service';
import { takeRestInCash } from './checkout-rest-in-cash.service';

/** The payment provider's webhook, a booking's deposit at the desk, a deposit request's link, and checkout at the desk. */
export function registerPaymentRoutes({ table, db, config, payments, mailer, sms }: AppDeps): void {
  const baseUrl = (req: express.Request) => config.publicUrl ?? `${req.protocol}://${req.get('host')}`;
  apiRoute(
    table,
    paymentsApi.webhook,
    ({ req }) => receivePaymentWebhook(db, { payments, senders: { mailer, sms } }, req.body as Buffer, req.get('stripe-signature'), new Date()),
    // The signature covers the exact bytes, so the body is kept raw (whatever its content type says).
    [express.raw({ type: () => true, limit: '256kb' })],
  );
  apiRoute(table, paymentsApi.deposit, ({ user, params }) => depositDetails(db, user, params.id));
  apiRoute(table, paymentsApi.requestDeposit, ({ user, params, body, req }) =>
    requestDeposit(db, { mailer, sms }, user, params.id, body.channel, baseUrl(req), new Date()),
  );
  apiRoute(table, paymentsApi.depositTaken, ({ user, params, body }) => markDepositTaken(db, payments, user, params.id, body));
  apiRoute(table, paymentsApi.payments, ({ user, params }) => bookingMoney(db, user, params.id));
  apiRoute(table, paymentsApi.refund, ({ user, params, body }) => refundPayment(db, { payments, senders: { mailer, sms } }, user, params.id, body, new Date()));
  apiRoute(table, paymentsApi.depositRequest, ({ params }) => viewDepositRequest(db, params.token, new Date()));
  apiRoute(table, deskCheckoutApi.view, ({ user, params }) => deskCheckoutView(db, user, params.id));
  apiRoute(table, deskCheckoutApi.checkOut, ({ user, params, body, req }) =>
    checkOutVisit(db, { payments, senders: { mailer, sms } }, user, params.id, body, baseUrl(req), new Date()),
  );
  apiRoute(table, deskCheckoutApi.restInCash, ({ user, params }) => takeRestInCash(db, { payments, senders: { mailer, sms } }, user, params.id, new Date()));
  apiRoute(table, paymentsApi.payDepositRequest, ({ params, req }) => payDepositRequest(db, payments, params.token, baseUrl(req), new Date()));
}
