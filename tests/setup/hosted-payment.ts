import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { TestApp } from './test-app';

/**
 * The app listening on a port of its own, so the payments fake can post its signed webhooks to it over HTTP as the
 * provider would (supertest alone never opens a port). Close it before the app.
 */
export async function listenForPaymentWebhooks(t: TestApp): Promise<{ url: string; close(): Promise<void> }> {
  const server: Server = await new Promise((resolve) => {
    const s = t.app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  t.payments.setWebhook(`${url}/webhooks/payments`);
  return {
    url,
    close: () =>
      new Promise((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}

export interface HostedAnswer {
  status: number;
  /** Where the page sends the browser next (the app's return page), when it does. */
  location: string | null;
  html: string;
}

/**
 * Pays on the payments fake's own hosted page as a browser would: loads the card form, posts the card to the fake
 * (never to the app), and answers an extra confirmation step when the card asks for one.
 */
export async function payOnHostedPage(checkoutUrl: string, cardNumber: string, extraStep: 'confirm' | 'refuse' = 'confirm'): Promise<HostedAnswer> {
  const form = await fetch(checkoutUrl);
  await form.text();
  const paid = await post(checkoutUrl, { number: cardNumber, expiry: '12/31', cvc: '123' });
  const attempt = /name="attempt" value="([^"]+)"/.exec(paid.html)?.[1];
  if (!attempt) return paid;
  return post(`${checkoutUrl}/confirm`, { attempt, answer: extraStep });
}

async function post(url: string, fields: Record<string, string>): Promise<HostedAnswer> {
  const res = await fetch(url, { method: 'POST', body: new URLSearchParams(fields), redirect: 'manual' });
  return { status: res.status, location: res.headers.get('location'), html: await res.text() };
}

/** Polls until `check` answers something truthy (a webhook's effect), or fails after `ms`. */
export async function eventually<T>(check: () => Promise<T | undefined | null | false>, ms = 10_000): Promise<T> {
  const until = Date.now() + ms;
  for (;;) {
    const found = await check();
    if (found) return found;
    if (Date.now() > until) throw new Error('not so in time');
    await new Promise((r) => setTimeout(r, 100));
  }
}
