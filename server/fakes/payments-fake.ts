import express, { type Request, type Response } from 'express';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createHash, randomBytes } from 'node:crypto';
import { formatMoney } from '@shared/money/money';
import { FaultPlan, pause, type FaultControls } from './fault-plan';
import { cardFormPage, extraStepPage, noticePage, type PageSession } from './payments-fake-page';
import { createWebhookSender, type WebhookControls } from './payments-fake-webhooks';

/** Card numbers the fake's hosted page knows, after the payment provider's published test cards. */
export const FAKE_CARDS = { succeeds: '4242424242424242', declined: '4000000000000002', extraStep: '4000002500003155' };

export interface FakeSession {
  id: string;
  object: 'checkout.session';
  mode: 'payment';
  status: 'open' | 'complete' | 'expired';
  payment_status: 'unpaid' | 'paid';
  amount_total: number;
  amount_subtotal: number;
  currency: string;
  success_url: string;
  cancel_url: string;
  url: string;
  client_reference_id: string | null;
  metadata: Record<string, string>;
  payment_intent: string | null;
  expires_at: number;
  created: number;
  livemode: false;
}

/** A card payment made on the hosted page (the provider's payment intent); only the card's last four digits are kept. */
export interface FakePayment {
  id: string;
  object: 'payment_intent';
  amount: number;
  currency: string;
  status: 'requires_action' | 'succeeded' | 'canceled';
  metadata: Record<string, string>;
  amount_refunded: number;
  last4: string;
  /** The session it pays. */
  session: string;
}

export interface FakeRefund {
  id: string;
  object: 'refund';
  amount: number;
  payment_intent: string;
  status: 'succeeded';
  metadata: Record<string, string>;
  created: number;
}

export interface PaymentsFake extends FaultControls, WebhookControls {
  /** Where the SDK reaches the API. */
  url: { host: string; port: number };
  sessions: Map<string, FakeSession>;
  payments: Map<string, FakePayment>;
  refunds: FakeRefund[];
  /** Card payments that went through: one charge each. */
  charges(): FakePayment[];
  /** Cards declined on the hosted page. */
  declines(): number;
  /** A refund made at the provider itself (its dashboard), not asked for by Dwell. */
  refundAtProvider(paymentIntentId: string, amount?: number): FakeRefund;
  close(): Promise<void>;
}

const newId = (prefix: string) => `${prefix}_${randomBytes(12).toString('hex')}`;
const apiError = (res: Response, status: number, error: Record<string, string>) =>
  res.status(status).json({ error: { type: 'invalid_request_error', ...error } });

/**
 * A local stand-in for the payment provider, reached through its official SDK (host/port/protocol options): hosted
 * payment sessions with the provider's own card page on this port (`/pay/:session`), refunds, and signed webhooks
 * to the app. Form-encoded bodies with nested keys; a repeated Idempotency-Key answers the first answer again.
 */
export async function startPaymentsFake(options: { port?: number; webhookSecret: string }): Promise<PaymentsFake> {
  const sessions = new Map<string, FakeSession>();
  const payments = new Map<string, FakePayment>();
  const refunds: FakeRefund[] = [];
  const descriptions = new Map<string, string>();
  const faults = new FaultPlan();
  const webhooks = createWebhookSender(options.webhookSecret);
  let declines = 0;
  let base = '';

  const app = express();
  app.use('/v1', express.urlencoded({ extended: true }), idempotentApi(faults));
  app.use('/pay', express.urlencoded({ extended: false, limit: '4kb' }));

  /** A session past its time is expired the first time anyone looks at it, and says so by webhook. */
  const current = (id: string): FakeSession | undefined => {
    const s = sessions.get(id);
    if (s?.status === 'open' && s.expires_at * 1000 <= Date.now()) expire(s);
    return s;
  };
  const expire = (s: FakeSession) => {
    s.status = 'expired';
    webhooks.emit('checkout.session.expired', s);
  };
  const pageSession = (s: FakeSession): PageSession => ({
    id: s.id,
    description: descriptions.get(s.id) ?? 'Payment',
    amountText: formatMoney(s.amount_total, s.currency.toUpperCase()),
    cancelUrl: s.cancel_url,
  });
  const refund = (payment: FakePayment, amount: number, metadata: Record<string, string>): FakeRefund => {
    const made: FakeRefund = {
      id: newId('re'),
      object: 'refund',
      amount,
      payment_intent: payment.id,
      status: 'succeeded',
      metadata,
      created: Math.floor(Date.now() / 1000),
    };
    payment.amount_refunded += amount;
    refunds.push(made);
    webhooks.emit('refund.created', made);
    return made;
  };

  // ——— The API the SDK calls ———

  app.post('/v1/checkout/sessions', (req, res) => {
    const item = req.body?.line_items?.[0]?.price_data;
    const amount = Number(item?.unit_amount);
    if (req.body?.mode !== 'payment' || !Number.isInteger(amount) || amount <= 0 || !item?.currency) {
      return void apiError(res, 400, { message: 'A payment session needs mode=payment and one line item with a whole positive unit_amount.' });
    }
    const id = newId('cs_test');
    const session: FakeSession = {
      id,
      object: 'checkout.session',
      mode: 'payment',
      status: 'open',
      payment_status: 'unpaid',
      amount_total: amount * Number(req.body.line_items[0].quantity ?? 1),
      amount_subtotal: amount * Number(req.body.line_items[0].quantity ?? 1),
      currency: String(item.currency).toLowerCase(),
      success_url: String(req.body.success_url ?? ''),
      cancel_url: String(req.body.cancel_url ?? ''),
      url: `${base}/pay/${id}`,
      client_reference_id: req.body.client_reference_id ?? null,
      metadata: req.body.metadata ?? {},
      payment_intent: null,
      // The provider keeps a session open for 24 hours unless told otherwise.
      expires_at: Number(req.body.expires_at ?? Math.floor(Date.now() / 1000) + 86_400),
      created: Math.floor(Date.now() / 1000),
      livemode: false,
    };
    sessions.set(id, session);
    descriptions.set(id, String(item.product_data?.name ?? 'Payment'));
    res.json(session);
  });
  app.get('/v1/checkout/sessions', (req, res) => {
    const data = [...sessions.values()].filter((s) => !req.query.payment_intent || s.payment_intent === req.query.payment_intent);
    res.json({ object: 'list', data, has_more: false, url: '/v1/checkout/sessions' });
  });
  app.get('/v1/checkout/sessions/:id', (req, res) => {
    const s = current(req.params.id);
    if (!s) return void apiError(res, 404, { code: 'resource_missing', message: `No such checkout.session: '${req.params.id}'` });
    res.json(s);
  });
  app.post('/v1/checkout/sessions/:id/expire', (req, res) => {
    const s = current(req.params.id);
    if (!s) return void apiError(res, 404, { code: 'resource_missing', message: `No such checkout.session: '${req.params.id}'` });
    if (s.status !== 'open') return void apiError(res, 400, { message: 'Only an open session can be expired.' });
    expire(s);
    res.json(s);
  });
  app.post('/v1/refunds', (req, res) => {
    const payment = payments.get(String(req.body.payment_intent));
    if (!payment || payment.status !== 'succeeded') return void apiError(res, 400, { message: 'Nothing to refund on that payment.' });
    const left = payment.amount - payment.amount_refunded;
    const amount = req.body.amount === undefined ? left : Number(req.body.amount);
    if (left <= 0) return void apiError(res, 400, { code: 'charge_already_refunded', message: 'This payment has already been refunded.' });
    if (!Number.isInteger(amount) || amount <= 0 || amount > left) {
      return void apiError(res, 400, { code: 'amount_too_large', message: `Refund at most ${left}.` });
    }
    res.json(refund(payment, amount, req.body.metadata ?? {}));
  });

  // ——— The hosted card page, on this port: the only place a card number is typed ———

  const notice = (res: Response, s: FakeSession | undefined) => {
    if (!s) return void res.status(404).type('html').send(noticePage('Payment page not found', 'This payment page does not exist.'));
    if (s.status === 'complete') {
      return void res.type('html').send(noticePage('Already paid', 'This payment has been made.', { href: successUrl(s), label: 'Continue' }));
    }
    res
      .status(410)
      .type('html')
      .send(noticePage('This payment page has expired', 'Nothing was charged.', { href: s.cancel_url, label: 'Go back' }));
  };
  app.get('/pay/:id', (req, res) => {
    const s = current(req.params.id);
    if (s?.status !== 'open') return notice(res, s);
    res.type('html').send(cardFormPage(pageSession(s)));
  });
  app.post('/pay/:id', (req, res) => {
    const s = current(req.params.id);
    if (s?.status !== 'open') return notice(res, s);
    const again = (status: number, error: string) =>
      void res
        .status(status)
        .type('html')
        .send(cardFormPage(pageSession(s), error));
    const number = String(req.body.number ?? '').replace(/[\s-]/g, '');
    const problem = cardProblem(number, String(req.body.expiry ?? ''), String(req.body.cvc ?? ''));
    if (problem) return again(400, problem);
    if (number === FAKE_CARDS.declined) {
      declines++;
      return again(402, 'Your card was declined. Try another card.');
    }
    if (number !== FAKE_CARDS.succeeds && number !== FAKE_CARDS.extraStep) {
      return again(400, 'This test service knows only the test cards listed below.');
    }
    const payment: FakePayment = {
      id: newId('pi'),
      object: 'payment_intent',
      amount: s.amount_total,
      currency: s.currency,
      status: number === FAKE_CARDS.extraStep ? 'requires_action' : 'succeeded',
      metadata: s.metadata,
      amount_refunded: 0,
      last4: number.slice(-4),
      session: s.id,
    };
    payments.set(payment.id, payment);
    if (payment.status === 'requires_action') return void res.type('html').send(extraStepPage(pageSession(s), payment.id));
    complete(s, payment, res);
  });
  app.post('/pay/:id/confirm', (req, res) => {
    const s = current(req.params.id);
    if (s?.status !== 'open') return notice(res, s);
    const payment = payments.get(String(req.body.attempt ?? ''));
    if (!payment || payment.session !== s.id || payment.status !== 'requires_action') {
      return void res
        .status(400)
        .type('html')
        .send(cardFormPage(pageSession(s), 'That confirmation is no longer waiting. Please pay again.'));
    }
    if (req.body.answer !== 'confirm') {
      payment.status = 'canceled';
      return void res
        .status(402)
        .type('html')
        .send(cardFormPage(pageSession(s), 'The payment was not confirmed. Try again or use another card.'));
    }
    payment.status = 'succeeded';
    complete(s, payment, res);
  });

  /** The session is paid: one charge, the signed webhook on its way, and the client sent back to the app. */
  function complete(s: FakeSession, payment: FakePayment, res: Response) {
    // Checked and set with no wait between them, so two tabs paying at once make one charge.
    if (s.status !== 'open') {
      payment.status = 'canceled';
      return notice(res, s);
    }
    payment.status = 'succeeded';
    s.status = 'complete';
    s.payment_status = 'paid';
    s.payment_intent = payment.id;
    webhooks.emit('checkout.session.completed', s);
    res.redirect(303, successUrl(s));
  }

  const server: Server = await new Promise((resolve) => {
    const s = app.listen(options.port ?? 0, '127.0.0.1', () => resolve(s));
  });
  const port = (server.address() as AddressInfo).port;
  base = `http://127.0.0.1:${port}`;
  return {
    url: { host: '127.0.0.1', port },
    sessions,
    payments,
    refunds,
    charges: () => [...payments.values()].filter((p) => p.status === 'succeeded'),
    declines: () => declines,
    refundAtProvider(paymentIntentId, amount) {
      const payment = payments.get(paymentIntentId);
      if (!payment || payment.status !== 'succeeded') throw new Error(`no payment ${paymentIntentId} to refund`);
      return refund(payment, amount ?? payment.amount - payment.amount_refunded, {});
    },
    failNext: (n) => faults.failNext(n),
    slowNext: (n, ms) => faults.slowNext(n, ms),
    ...webhooks.controls,
    close: () =>
      new Promise((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}

const successUrl = (s: FakeSession) => s.success_url.replace('{CHECKOUT_SESSION_ID}', s.id);

/** What is wrong with a typed card, in the page's words; null when it may be tried. */
function cardProblem(number: string, expiry: string, cvc: string): string | null {
  if (!/^\d{12,19}$/.test(number) || !passesLuhn(number)) return 'Check the card number.';
  const m = /^\s*(\d{1,2})\s*\/?\s*(\d{2}|\d{4})\s*$/.exec(expiry);
  const month = Number(m?.[1]);
  const year = m?.[2]?.length === 2 ? 2000 + Number(m[2]) : Number(m?.[2]);
  const now = new Date();
  if (!m || month < 1 || month > 12) return 'Enter the expiry as MM/YY.';
  if (year < now.getUTCFullYear() || (year === now.getUTCFullYear() && month < now.getUTCMonth() + 1)) return 'This card has expired.';
  if (!/^\d{3,4}$/.test(cvc.trim())) return 'Enter the 3 or 4 digits of the security code.';
  return null;
}

/** The Luhn check digit (ISO/IEC 7812-1), which every card number passes. */
function passesLuhn(digits: string): boolean {
  let sum = 0;
  for (let i = 0; i < digits.length; i++) {
    let d = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) d = d * 2 > 9 ? d * 2 - 9 : d * 2;
    sum += d;
  }
  return sum % 10 === 0;
}

/**
 * Faults first (an outage refuses, a slow answer comes late), then the provider's idempotency: a repeated key with
 * the same parameters answers the first answer again; with other parameters it is refused; while the first request
 * with a key is still in hand, a repeat gets 409 (the SDK retries on 409).
 */
function idempotentApi(faults: FaultPlan) {
  const replies = new Map<string, { params: string; status: number; body: unknown }>();
  const inFlight = new Set<string>();
  return (req: Request, res: Response, next: () => void) => {
    const fault = faults.take();
    if (fault?.kind === 'fail') return void res.status(500).json({ error: { type: 'api_error', message: 'Fake outage' } });
    const key = req.get('Idempotency-Key');
    const params = createHash('sha256')
      .update(`${req.method} ${req.path} ${JSON.stringify(req.body ?? {})}`)
      .digest('hex');
    const earlier = key && replies.get(key);
    if (earlier && earlier.params !== params) {
      return void apiError(res, 400, {
        type: 'idempotency_error',
        message: 'Keys for idempotent requests can only be used with the same parameters they were first used with.',
      });
    }
    if (earlier) return void res.status(earlier.status).json(earlier.body);
    if (key && inFlight.has(key)) {
      return void res
        .status(409)
        .json({ error: { type: 'idempotency_error', message: 'There is currently another in-progress request using this Idempotent Key.' } });
    }
    if (key) {
      inFlight.add(key);
      const json = res.json.bind(res);
      res.json = (body) => {
        if (res.statusCode < 500) replies.set(key, { params, status: res.statusCode, body });
        inFlight.delete(key);
        return json(body);
      };
    }
    // Slow: the work is done at once, its answer comes late (what makes a caller time out and retry).
    if (fault?.kind === 'slow') {
      const json = res.json.bind(res);
      res.json = (body) => {
        void pause(fault.ms).then(() => json(body));
        return res;
      };
    }
    next();
  };
}
