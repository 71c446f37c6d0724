import Stripe from 'stripe';

/**
 * A hosted payment session (the provider's Checkout Session) as Dwell reads it. The client types their card on the
 * provider's own page; Dwell sends an amount and learns the outcome from a signed webhook, never a card number.
 */
export interface CheckoutSession {
  id: string;
  url: string | null;
  status: 'open' | 'complete' | 'expired';
  paid: boolean;
  /** In the currency's minor unit (ISO 4217 exponent), as Dwell stores amounts. */
  amountMinor: number;
  /** Upper-case ISO 4217 code. */
  currency: string;
  paymentIntentId: string | null;
  metadata: Record<string, string>;
}

export interface ProviderRefund {
  id: string;
  paymentIntentId: string;
  amountMinor: number;
  status: 'pending' | 'succeeded' | 'failed' | 'canceled' | 'requires_action';
  metadata: Record<string, string>;
}

/** A webhook event whose signature checked out, reduced to what Dwell acts on. */
export type PaymentEvent = { id: string; objectId: string | null } & (
  | { type: 'checkout.session.completed' | 'checkout.session.expired'; session: CheckoutSession }
  | { type: 'refund.created' | 'refund.updated'; refund: ProviderRefund }
  | { type: 'other'; providerType: string }
);

export interface NewCheckout {
  amountMinor: number;
  currency: string;
  /** What the client pays for, on the hosted page. */
  description: string;
  successUrl: string;
  cancelUrl: string;
  expiresAt: Date;
  metadata: Record<string, string>;
}

export interface Payments {
  /** Opens a hosted payment session; the same key answers the same session (the provider's idempotency). */
  createCheckout(input: NewCheckout, idempotencyKey: string): Promise<CheckoutSession>;
  /** The session as the provider has it now; null when the provider does not know it. */
  findCheckout(id: string): Promise<CheckoutSession | null>;
  /** The session a payment was made through (for an event that names only the payment). */
  checkoutOfPayment(paymentIntentId: string): Promise<CheckoutSession | null>;
  /** Closes an open session so nobody can pay on it any more; a session no longer open is left as it is. */
  expireCheckout(id: string): Promise<void>;
  /** Returns money to the card; one refund per idempotency key however often it is asked. */
  refund(input: { paymentIntentId: string; amountMinor: number; metadata: Record<string, string> }, idempotencyKey: string): Promise<ProviderRefund>;
  /** Checks the Stripe-Signature header of a webhook against its raw body; throws WebhookSignatureError when it fails. */
  readEvent(rawBody: Buffer, signature: string | undefined): PaymentEvent;
}

export class WebhookSignatureError extends Error {}

/** Payments through the official Stripe SDK; outside production its host and port point at the local fake. */
export function createPayments(config: { secretKey: string; webhookSecret: string; host?: string; port?: number }): Payments {
  const stripe = new Stripe(config.secretKey, {
    ...(config.host ? { host: config.host, port: config.port, protocol: 'http' as const } : {}),
    // Retries reuse the request's idempotency key, so a retried session or refund is never a second one.
    maxNetworkRetries: 2,
    timeout: 20_000,
    telemetry: false,
  });
  const orNull = async <T>(read: () => Promise<T>): Promise<T | null> => {
    try {
      return await read();
    } catch (err) {
      if (err instanceof Stripe.errors.StripeInvalidRequestError && err.statusCode === 404) return null;
      throw err;
    }
  };
  return {
    async createCheckout(input, idempotencyKey) {
      const session = await stripe.checkout.sessions.create(
        {
          mode: 'payment',
          line_items: [
            { quantity: 1, price_data: { currency: input.currency.toLowerCase(), unit_amount: input.amountMinor, product_data: { name: input.description } } },
          ],
          success_url: input.successUrl,
          cancel_url: input.cancelUrl,
          expires_at: Math.floor(input.expiresAt.getTime() / 1000),
          client_reference_id: input.metadata.checkout,
          metadata: input.metadata,
          // The payment carries the same labels, so an event about the payment alone still says what it was for.
          payment_intent_data: { metadata: input.metadata },
        },
        { idempotencyKey },
      );
      return checkoutOf(session);
    },
    findCheckout: (id) => orNull(async () => checkoutOf(await stripe.checkout.sessions.retrieve(id))),
    async checkoutOfPayment(paymentIntentId) {
      const list = await stripe.checkout.sessions.list({ payment_intent: paymentIntentId, limit: 1 });
      const [first] = list.data;
      return first ? checkoutOf(first) : null;
    },
    async expireCheckout(id) {
      const found = await orNull(() => stripe.checkout.sessions.retrieve(id));
      if (found?.status === 'open') await stripe.checkout.sessions.expire(id);
    },
    async refund({ paymentIntentId, amountMinor, metadata }, idempotencyKey) {
      return refundOf(await stripe.refunds.create({ payment_intent: paymentIntentId, amount: amountMinor, metadata }, { idempotencyKey }));
    },
    readEvent(rawBody, signature) {
      let event: Stripe.Event;
      try {
        event = stripe.webhooks.constructEvent(rawBody, signature ?? '', config.webhookSecret);
      } catch (err) {
        throw new WebhookSignatureError((err as Error).message);
      }
      const object = event.data.object as { id?: string };
      const base = { id: event.id, objectId: typeof object.id === 'string' ? object.id : null };
      switch (event.type) {
        case 'checkout.session.completed':
        case 'checkout.session.expired':
          return { ...base, type: event.type, session: checkoutOf(event.data.object) };
        case 'refund.created':
        case 'refund.updated':
          return { ...base, type: event.type, refund: refundOf(event.data.object) };
        default:
          return { ...base, type: 'other', providerType: event.type };
      }
    },
  };
}

function checkoutOf(s: Stripe.Checkout.Session): CheckoutSession {
  return {
    id: s.id,
    url: s.url,
    status: s.status === 'complete' ? 'complete' : s.status === 'expired' ? 'expired' : 'open',
    paid: s.payment_status === 'paid',
    amountMinor: s.amount_total ?? 0,
    currency: (s.currency ?? '').toUpperCase(),
    paymentIntentId: typeof s.payment_intent === 'string' ? s.payment_intent : (s.payment_intent?.id ?? null),
    metadata: s.metadata ?? {},
  };
}

function refundOf(r: Stripe.Refund): ProviderRefund {
  return {
    id: r.id,
    paymentIntentId: typeof r.payment_intent === 'string' ? r.payment_intent : (r.payment_intent?.id ?? ''),
    amountMinor: r.amount,
    status: (r.status ?? 'pending') as ProviderRefund['status'],
    metadata: r.metadata ?? {},
  };
}
