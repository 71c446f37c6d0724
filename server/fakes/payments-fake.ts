import express, { type Response } from 'express';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { randomBytes } from 'node:crypto';
import { FaultPlan, pause, type FaultControls } from './fault-plan';

/** Card numbers the fake knows, after the payment provider's published test cards. */
export const FAKE_CARDS = { succeeds: '4242424242424242', declined: '4000000000000002' };

interface Intent {
  id: string;
  object: 'payment_intent';
  amount: number;
  currency: string;
  status: 'requires_payment_method' | 'requires_confirmation' | 'succeeded' | 'canceled';
  payment_method: string | null;
  metadata: Record<string, string>;
  amount_refunded: number;
  last_payment_error: { code: string; message: string } | null;
}

export interface PaymentsFake extends FaultControls {
  url: { host: string; port: number };
  intents: Map<string, Intent>;
  refunds: { id: string; payment_intent: string; amount: number }[];
  /** Runs once, after the next successful charge and before it is answered (to play a slow confirmation). */
  onNextSuccess(hook: () => Promise<void>): void;
  close(): Promise<void>;
}

const id = (prefix: string) => `${prefix}_${randomBytes(12).toString('hex')}`;
const cardError = (res: Response, intent: Intent) =>
  res.status(402).json({
    error: { type: 'card_error', code: 'card_declined', decline_code: 'generic_decline', message: 'Your card was declined.', payment_intent: intent },
  });

/**
 * A local stand-in for the payment provider's REST API, reached through its official SDK (host/port/protocol
 * options). Form-encoded bodies with nested keys; answers the same for a repeated Idempotency-Key.
 */
export async function startPaymentsFake(port = 0): Promise<PaymentsFake> {
  const methods = new Map<string, { number: string; last4: string }>();
  const intents = new Map<string, Intent>();
  const refunds: PaymentsFake['refunds'] = [];
  const replies = new Map<string, { status: number; body: unknown }>();
  const faults = new FaultPlan();
  const inFlight = new Set<string>();
  let successHook: (() => Promise<void>) | null = null;
  const app = express();
  app.use(express.urlencoded({ extended: true }));
  app.use(async (req, res, next) => {
    const fault = faults.take();
    if (fault?.kind === 'fail') return void res.status(500).json({ error: { type: 'api_error', message: 'Fake outage' } });
    // Replay the first answer to a repeated Idempotency-Key, as the real service does; while the first
    // request with a key is still being handled, a repeat is refused with 409 (the SDK retries on 409).
    const key = req.get('Idempotency-Key');
    const earlier = key && replies.get(key);
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
        replies.set(key, { status: res.statusCode, body });
        inFlight.delete(key);
        return json(body);
      };
    }
    // Slow: the charge is made at once, its answer comes late (what makes a client time out and retry).
    if (fault?.kind === 'slow') {
      const json = res.json.bind(res);
      res.json = (body) => {
        void pause(fault.ms).then(() => json(body));
        return res;
      };
    }
    next();
  });
  const confirm = (intent: Intent, res: Response) => {
    const card = intent.payment_method ? methods.get(intent.payment_method) : undefined;
    if (!card || card.number === FAKE_CARDS.declined) {
      intent.status = 'requires_payment_method';
      intent.last_payment_error = { code: 'card_declined', message: 'Your card was declined.' };
      return cardError(res, intent);
    }
    intent.status = 'succeeded';
    const hook = successHook;
    successHook = null;
    if (!hook) return void res.json(intent);
    hook().then(
      () => res.json(intent),
      () => res.json(intent),
    );
  };
  app.post('/v1/payment_methods', (req, res) => {
    const number = String(req.body?.card?.number ?? '').replace(/\s/g, '');
    if (!/^\d{12,19}$/.test(number))
      return void res.status(402).json({ error: { type: 'card_error', code: 'incorrect_number', message: 'Your card number is incorrect.' } });
    const pm = id('pm');
    methods.set(pm, { number, last4: number.slice(-4) });
    res.json({ id: pm, object: 'payment_method', type: 'card', card: { last4: number.slice(-4), brand: number.startsWith('4') ? 'visa' : 'unknown' } });
  });
  app.post('/v1/payment_intents', (req, res) => {
    const intent: Intent = {
      id: id('pi'),
      object: 'payment_intent',
      amount: Number(req.body.amount),
      currency: String(req.body.currency ?? 'usd'),
      status: req.body.payment_method ? 'requires_confirmation' : 'requires_payment_method',
      payment_method: req.body.payment_method ?? null,
      metadata: req.body.metadata ?? {},
      amount_refunded: 0,
      last_payment_error: null,
    };
    intents.set(intent.id, intent);
    if (req.body.confirm === 'true') return confirm(intent, res);
    res.json(intent);
  });
  app.post('/v1/payment_intents/:id/confirm', (req, res) => {
    const intent = intents.get(req.params.id);
    if (!intent) return void res.status(404).json({ error: { type: 'invalid_request_error', message: 'No such payment_intent' } });
    if (req.body.payment_method) intent.payment_method = req.body.payment_method;
    confirm(intent, res);
  });
  app.get('/v1/payment_intents/:id', (req, res) => {
    const intent = intents.get(req.params.id);
    if (!intent) return void res.status(404).json({ error: { type: 'invalid_request_error', message: 'No such payment_intent' } });
    res.json(intent);
  });
  app.post('/v1/refunds', (req, res) => {
    const intent = intents.get(String(req.body.payment_intent));
    if (!intent || intent.status !== 'succeeded') return void res.status(400).json({ error: { type: 'invalid_request_error', message: 'Nothing to refund' } });
    const refund = { id: id('re'), object: 'refund', payment_intent: intent.id, amount: intent.amount - intent.amount_refunded, status: 'succeeded' };
    intent.amount_refunded = intent.amount;
    refunds.push(refund);
    res.json(refund);
  });
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(port, '127.0.0.1', () => resolve(s));
  });
  return {
    url: { host: '127.0.0.1', port: (server.address() as AddressInfo).port },
    intents,
    refunds,
    failNext: (n) => faults.failNext(n),
    slowNext: (n, ms) => faults.slowNext(n, ms),
    onNextSuccess: (hook) => {
      successHook = hook;
    },
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
