import { randomBytes } from 'node:crypto';
import Stripe from 'stripe';
import { pause } from './fault-plan';

/** An event as the provider posts it to a webhook endpoint. */
export interface FakeEvent {
  id: string;
  object: 'event';
  type: string;
  created: number;
  livemode: false;
  data: { object: unknown };
}

export interface Delivery {
  eventId: string;
  type: string;
  /** The webhook's answer; 0 when it could not be reached. */
  status: number;
  at: Date;
}

/** What the webhook fake does with the next events, for tests and `npm run faults`. */
export interface WebhookControls {
  /** Where events are posted (the app's `POST /webhooks/payments`); until it is set, events wait. */
  setWebhook(url: string): void;
  /** Keep the events made from now on instead of posting them (a provider that is late), until releaseHeld. */
  holdWebhooks(): void;
  /** Posts the events held back, in the order made or the reverse, and stops holding. Resolves with their answers. */
  releaseHeld(order?: 'made' | 'reverse'): Promise<number[]>;
  /** Posts an event again, freshly signed (the provider retrying one it thinks was not received). */
  resend(eventId: string): Promise<number>;
  events: FakeEvent[];
  deliveries: Delivery[];
}

// Like the provider, a delivery the endpoint did not accept is tried again, here after 1, 2 and 4 seconds.
const RETRY_MS = [1_000, 2_000, 4_000];

/**
 * The fake's outgoing webhooks, signed as the provider signs them: a `Stripe-Signature` header `t=<unix
 * seconds>,v1=<HMAC-SHA256 of "t.payload" with the endpoint's secret>`, made by the SDK's own test helper.
 */
export function createWebhookSender(secret: string) {
  let url: string | null = null;
  let holding = false;
  const waiting: FakeEvent[] = [];
  const held: FakeEvent[] = [];
  const events: FakeEvent[] = [];
  const deliveries: Delivery[] = [];
  const stripe = new Stripe('sk_test_local_fake');

  async function post(event: FakeEvent): Promise<number> {
    if (!url) return 0;
    const payload = JSON.stringify(event);
    const header = stripe.webhooks.generateTestHeaderString({ payload, secret });
    const status = await fetch(url, { method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': header }, body: payload }).then(
      (res) => res.status,
      () => 0,
    );
    deliveries.push({ eventId: event.id, type: event.type, status, at: new Date() });
    return status;
  }

  async function deliver(event: FakeEvent): Promise<number> {
    let status = await post(event);
    for (const wait of RETRY_MS) {
      if (status >= 200 && status < 300) break;
      await pause(wait);
      status = await post(event);
    }
    return status;
  }

  const controls: WebhookControls = {
    setWebhook(to) {
      url = to;
      for (const event of waiting.splice(0)) void deliver(event);
    },
    holdWebhooks() {
      holding = true;
    },
    async releaseHeld(order = 'made') {
      holding = false;
      const batch = held.splice(0);
      if (order === 'reverse') batch.reverse();
      const answers: number[] = [];
      for (const event of batch) answers.push(await deliver(event));
      return answers;
    },
    async resend(eventId) {
      const event = events.find((e) => e.id === eventId);
      if (!event) throw new Error(`no event ${eventId}`);
      return post(event);
    },
    events,
    deliveries,
  };

  return {
    controls,
    /** Makes an event about `object` and posts it (unless held back or no webhook is set yet); never waits for it. */
    emit(type: string, object: unknown): FakeEvent {
      const event: FakeEvent = {
        id: `evt_${randomBytes(12).toString('hex')}`,
        object: 'event',
        type,
        created: Math.floor(Date.now() / 1000),
        livemode: false,
        // A snapshot: later changes to the object do not change what this event said.
        data: { object: structuredClone(object) },
      };
      events.push(event);
      if (holding) held.push(event);
      else if (!url) waiting.push(event);
      else void deliver(event);
      return event;
    },
  };
}
