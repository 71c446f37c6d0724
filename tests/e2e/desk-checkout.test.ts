import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb, createPool } from '@server/db/database';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { insertSittingAround } from '../factories/day-of-service';
import { insertDemoStylist, removeDemoVisit } from '../factories/demo-visit';
import { apiWrite, baseUrl, connectBrowser, expectAccessible, screenshot, signedInPage } from '../setup/browser';

// The desk checks a client out in the demo salon when the visit ends: a product, a tip, the balance paid on the
// payment service's hosted page (opened for the client in a new tab), and the receipt by e-mail in the Outbox.

const gloss: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'hands_on', label: 'Gloss', product: 'toner_direct', minutes: 30 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 15 },
      ],
    },
  ],
};

const pool = createPool(inject('databaseUrl'));
const db = createDb(pool);
let browser: Browser;
let bookingId: string;
/** A second visit of the same client, earlier the same day, whose card part the client pays in cash after all. */
let cashInstead: string;
const made: { userId?: string; staffId?: string } = {};

beforeAll(async () => {
  browser = await connectBrowser();
  const salon = await db.selectFrom('salons').select('id').where('slug', '=', 'kestrel-and-pine').executeTakeFirstOrThrow();
  Object.assign(made, await insertDemoStylist(db, salon.id, { name: 'Wren Calder', displayName: 'Wren', email: `wren.${Date.now()}@demo.test` }));
  const client = await db
    .selectFrom('clients')
    .select('id')
    .where('salon_id', '=', salon.id)
    .where('email', 'is not', null)
    .orderBy('name')
    .executeTakeFirstOrThrow();
  const service = await db
    .selectFrom('services')
    .select('id')
    .where('salon_id', '=', salon.id)
    .where('price_is_from', '=', false)
    .where('category', '=', 'colour')
    .executeTakeFirstOrThrow();
  // A $30.00 deposit, the visit an hour ago and over: the client came and the sitting is finished.
  bookingId = await insertSittingAround(db, {
    salonId: salon.id,
    serviceId: service.id,
    stylistId: made.staffId!,
    clientId: client.id,
    minutesAgo: 60,
    depositCents: 3000,
    plan: gloss,
  });
  cashInstead = await insertSittingAround(db, {
    salonId: salon.id,
    serviceId: service.id,
    stylistId: made.staffId!,
    clientId: client.id,
    minutesAgo: 180,
    depositCents: 0,
    plan: gloss,
  });
});

afterAll(async () => {
  await browser.close();
  await removeDemoVisit(db, cashInstead, {});
  await removeDemoVisit(db, bookingId, made);
  await db.destroy();
});

/** No part of the page is wider than the window (nothing to scroll sideways). */
const fitsWidth = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);

describe('checkout at the desk', () => {
  it('the desk checks the client out with the balance and a tip, the client pays on the hosted page, the receipt is in the Outbox', async () => {
    const desk = await signedInPage(browser, 'desk@demo.test', '/desk');
    expect(await apiWrite(desk, 'POST', `/api/bookings/${bookingId}/deposit/taken`, { method: 'cash' })).toBe(200);
    await db.updateTable('sittings').set({ status: 'finished', arrived_at: new Date(), late_minutes: 0 }).where('booking_id', '=', bookingId).execute();
    await db.updateTable('bookings').set({ status: 'finished' }).where('id', '=', bookingId).execute();

    await desk.goto(`${baseUrl()}/desk/bookings/${bookingId}`);
    await desk.getByRole('link', { name: 'Check out' }).click();
    await desk.getByRole('heading', { level: 1, name: /^Checkout · / }).waitFor();
    const form = desk.getByRole('form', { name: 'Checkout' });
    await form.getByLabel('Product', { exact: true }).selectOption({ index: 0 });
    await form.getByRole('button', { name: 'Add product' }).click();
    await form.getByRole('list', { name: 'Products sold' }).getByText(/^1 × /).waitFor();
    await form.getByLabel('Tip (USD)').fill('10.00');
    const receipt = desk.getByRole('table', { name: 'The receipt as it will be' });
    await receipt.getByText('Tip for Wren').waitFor();
    await receipt.getByText('Deposit paid before').waitFor();
    await expectAccessible(desk);
    await screenshot(desk, 'desk-checkout', true, false);
    // The same page at 375 px: nothing runs off the side, every control still reachable.
    await desk.setViewportSize({ width: 375, height: 812 });
    expect(await fitsWidth(desk)).toBe(true);
    await expectAccessible(desk);
    await desk.setViewportSize({ width: 1280, height: 900 });

    const take = form.getByRole('button', { name: /^Take \$[\d,.]+$/ });
    const shown = (await take.textContent())!.replace('Take ', '');
    const [answer] = await Promise.all([
      desk.waitForResponse((r) => r.url().endsWith(`/api/bookings/${bookingId}/checkout`) && r.request().method() === 'POST' && r.status() !== 403),
      take.click(),
    ]);
    expect(answer.status(), await answer.text()).toBe(201);

    // The payment page opens for the client in a new tab (the salon's tablet); the card is typed there, never into Dwell.
    const link = desk.getByRole('link', { name: 'Open the payment page' });
    const [tablet] = await Promise.all([desk.context().waitForEvent('page'), link.click()]);
    await tablet.waitForURL((url) => url.origin !== new URL(baseUrl()).origin && url.pathname.startsWith('/pay/'));
    await tablet.getByText(shown).first().waitFor();
    await tablet.getByLabel('Card number').fill('4242 4242 4242 4242');
    await tablet.getByLabel('Expiry (MM/YY)').fill('12/31');
    await tablet.getByLabel('Security code').fill('123');
    await tablet.getByRole('button', { name: /^Pay / }).click();
    await tablet.waitForURL(/\/desk\/bookings\/[^/]+\/checkout\?payment=done$/);
    await tablet.close();

    // The desk's page waits for the payment service's confirmation (the signed webhook), then shows it paid.
    await desk.getByText(/Paid: \$[\d,.]+\. The visit is checked out\.$/).waitFor({ timeout: 20_000 });
    await desk.getByText('Checked out', { exact: true }).waitFor();
    await desk.getByRole('list', { name: 'Payments at this checkout' }).getByText('Tip for Wren, card').waitFor();

    await desk.getByRole('link', { name: 'Printable receipt' }).click();
    await desk.getByRole('button', { name: 'Print' }).waitFor();
    const printed = desk.getByRole('article', { name: 'Receipt' });
    await printed
      .getByText(/^Tax|^Total$/)
      .first()
      .waitFor();
    await printed.getByText('Paid by card.').waitFor();
    await desk.emulateMedia({ media: 'print' });
    expect(await desk.getByRole('button', { name: 'Print' }).isVisible()).toBe(false);
    await desk.emulateMedia({ media: 'screen' });

    await desk.getByRole('link', { name: 'Outbox (demo)' }).first().click();
    await desk.getByRole('heading', { level: 1, name: 'Outbox (demo)' }).waitFor();
    const row = desk.getByRole('row').filter({ hasText: 'Receipt (e-mail)' }).first();
    await expect.poll(async () => (await row.count()) > 0 || (await desk.reload(), false), { timeout: 60_000, interval: 2000 }).toBe(true);
    await desk.context().close();
  });

  it('on a phone: the card part taken in cash after all, asked first, closes the payment page and checks the visit out', async () => {
    const desk = await signedInPage(browser, 'desk@demo.test', '/desk');
    await desk.setViewportSize({ width: 375, height: 812 });
    await db.updateTable('sittings').set({ status: 'finished', arrived_at: new Date(), late_minutes: 0 }).where('booking_id', '=', cashInstead).execute();
    await db.updateTable('bookings').set({ status: 'finished' }).where('id', '=', cashInstead).execute();
    const checkout = { services: [{}], retail: [], discount: null, tipCents: 500, pay: { method: 'card' } };
    expect(await apiWrite(desk, 'POST', `/api/bookings/${cashInstead}/checkout`, checkout)).toBe(201);

    await desk.goto(`${baseUrl()}/desk/bookings/${cashInstead}/checkout`);
    await desk.getByRole('link', { name: 'Open the payment page' }).waitFor();
    await desk.getByRole('button', { name: 'Take it in cash instead' }).click();
    const ask = desk.getByRole('group', { name: 'Take the card part in cash?' });
    // Focus waits on "Keep the card page", so a second Enter cannot take the cash by accident.
    await expect.poll(() => ask.getByRole('button', { name: 'Keep the card page' }).evaluate((b) => b === document.activeElement)).toBe(true);
    expect(await fitsWidth(desk)).toBe(true);
    await screenshot(desk, 'desk-checkout-cash-instead-375', true, false);
    await ask.getByRole('button', { name: /^Yes, \$[\d,.]+ in cash$/ }).click();

    await desk.getByText(/Paid: \$[\d,.]+\. The visit is checked out\.$/).waitFor();
    const paid = desk.getByRole('list', { name: 'Payments at this checkout' });
    await paid.getByText('Balance, cash').waitFor();
    await paid.getByText('Tip for Wren, cash').waitFor();
    expect(await desk.getByRole('link', { name: 'Open the payment page' }).count()).toBe(0);
    await desk.context().close();
  });
});
