import Stripe from 'stripe';

export interface CardInput {
  number: string;
  expMonth: number;
  expYear: number;
  cvc: string;
}

export type ChargeResult = { ok: true; paymentIntentId: string } | { ok: false; message: string; paymentIntentId: string | null };

export interface Payments {
  /** Charges a deposit once per idempotency key; a declined card is an answer, not an exception. */
  charge(input: { amountCents: number; currency: string; card: CardInput; idempotencyKey: string; metadata: Record<string, string> }): Promise<ChargeResult>;
  refund(paymentIntentId: string, idempotencyKey: string): Promise<void>;
}

/** Deposits through the official Stripe SDK; outside production its host and port point at the local fake. */
export function createPayments(config: { secretKey: string; host?: string; port?: number }): Payments {
  const stripe = new Stripe(config.secretKey, {
    ...(config.host ? { host: config.host, port: config.port, protocol: 'http' as const } : {}),
    // Retries reuse the request's idempotency key, so a retried charge is never a second charge.
    maxNetworkRetries: 2,
    timeout: 20_000,
    telemetry: false,
  });
  return {
    async charge({ amountCents, currency, card, idempotencyKey, metadata }) {
      try {
        const method = await stripe.paymentMethods.create(
          { type: 'card', card: { number: card.number, exp_month: card.expMonth, exp_year: card.expYear, cvc: card.cvc } },
          { idempotencyKey: `${idempotencyKey}:method` },
        );
        const intent = await stripe.paymentIntents.create(
          { amount: amountCents, currency: currency.toLowerCase(), payment_method: method.id, confirm: true, metadata },
          { idempotencyKey: `${idempotencyKey}:intent` },
        );
        return intent.status === 'succeeded'
          ? { ok: true, paymentIntentId: intent.id }
          : { ok: false, message: 'The payment did not go through.', paymentIntentId: intent.id };
      } catch (err) {
        if (err instanceof Stripe.errors.StripeCardError) {
          return { ok: false, message: err.message, paymentIntentId: (err.raw as { payment_intent?: { id: string } }).payment_intent?.id ?? null };
        }
        throw err;
      }
    },
    async refund(paymentIntentId, idempotencyKey) {
      await stripe.refunds.create({ payment_intent: paymentIntentId }, { idempotencyKey });
    },
  };
}
