import { DateTime } from 'luxon';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, connectBrowser, expectAccessible, screenshot, signedInPage } from '../setup/browser';

// The desk and the deposits of bookings made at the desk, in the demo salon (every fourth booking still to come has
// its deposit due: server/demo/load-demo-salon.ts).

let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(() => browser.close());

type Booking = { id: string; status: string; client: { name: string }; deposit: { status: string; dueCents: number } };
const getJson = async (page: Page, path: string) => (await page.request.get(`${baseUrl()}${path}`)).json();

describe('deposits at the desk', () => {
  it("a request by SMS opens the payment service's page, where 4242 pays it; another deposit is taken on the card terminal", async () => {
    const desk = await signedInPage(browser, 'desk@demo.test', '/desk');
    const today = DateTime.now().setZone('America/Denver').toISODate()!;
    const { bookings } = (await getJson(desk, `/api/desk/week?date=${today}`)) as { bookings: Booking[] };
    const due = bookings.filter((b) => b.status === 'booked' && b.deposit.status === 'due');
    expect(due.length).toBeGreaterThanOrEqual(2);
    const [asked, taken] = due as [Booking, Booking];

    await desk.goto(`${baseUrl()}/desk/bookings/${asked.id}`);
    const panel = desk.getByRole('region', { name: 'Deposit' });
    await panel.getByText(/^Deposit due \$/).waitFor();
    await expectAccessible(desk);
    await panel.getByRole('button', { name: 'Send request by SMS' }).click();
    await panel.getByText(/is on its way; the Outbox shows it/).waitFor();
    const sms = (await getJson(desk, '/api/dev/sms')) as { messages: { body: string }[] };
    const link = sms.messages
      .map((m) => /(http\S+\/deposit\/[A-Za-z0-9_-]+)/.exec(m.body)?.[1])
      .filter(Boolean)
      .at(-1)!;

    // The client opens the link on a phone, pays on the payment service's own page, and comes back to it.
    const phone = await (await browser.newContext({ viewport: { width: 375, height: 812 }, isMobile: true, hasTouch: true })).newPage();
    // An amount written into the address changes nothing: the page and the payment ask what the server says is due
    // (ISO 4217 USD, 2 decimals: cents to dollars).
    await phone.goto(`${link}?amount=1`);
    const dueText = new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' }).format(asked.deposit.dueCents / 100);
    const pay = phone.getByRole('button', { name: `Pay deposit of ${dueText}` });
    await pay.waitFor();
    await expectAccessible(phone);
    await pay.click();
    await phone.waitForURL((url) => url.origin !== new URL(baseUrl()).origin && url.pathname.startsWith('/pay/'));
    await phone.getByLabel('Card number').fill('4242 4242 4242 4242');
    await phone.getByLabel('Expiry (MM/YY)').fill('12/31');
    await phone.getByLabel('Security code').fill('123');
    await phone.getByRole('button', { name: /^Pay / }).click();
    await phone.waitForURL(/\/deposit\/[^/?]+\?payment=done$/);
    await phone.getByText('Your deposit is paid').waitFor();
    await screenshot(phone, 'client-deposit-request-paid');
    await phone.context().close();

    // The desk's page shows it paid, online, with the request it answered (live updates refresh it; a reload is sure).
    await desk.reload();
    await panel.getByText('Deposit paid', { exact: true }).waitFor();
    await panel.getByText(/Card, on the payment page/).waitFor();
    await panel.getByText(/^Requested \$[\d.,]+ by SMS/).waitFor();
    await screenshot(desk, 'desk-booking-deposit', true, false);

    // Another booking's deposit taken at the desk on the salon's card terminal, with who took it.
    await desk.goto(`${baseUrl()}/desk/bookings/${taken.id}`);
    await panel.getByLabel('Card terminal').check();
    await panel.getByLabel('Note (optional)').fill('Terminal receipt 0042');
    await panel.getByRole('button', { name: /^Mark \$[\d.,]+ taken$/ }).click();
    await panel.getByText(/Card terminal at the desk · \$[\d.,]+ · taken by Sam Okafor/).waitFor();
    await panel.getByText('Deposit paid', { exact: true }).waitFor();
    await expectAccessible(desk);
    await desk.context().close();
  });
});
