import { DateTime } from 'luxon';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, expect, it } from 'vitest';
import { connectBrowser, screenshot, signedInPage } from '../setup/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(() => browser.close());

it('a booking made at the desk shows its confirmation in the Outbox', async () => {
  const page = await signedInPage(browser, 'desk@demo.test', '/desk');
  await page.getByRole('link', { name: 'Book a service' }).first().click();
  await page.getByRole('heading', { level: 1, name: 'Book a service' }).waitFor();
  await page.getByLabel('Client').fill('Hollis');
  await page
    .getByRole('list', { name: 'Matching clients' })
    .getByRole('button', { name: /Hollis Grant/ })
    .click();
  await page.getByLabel('Service').selectOption({ label: 'Cut & finish' });
  const later = DateTime.now().setZone('America/Denver').plus({ days: 9 }).toISODate()!;
  await page.getByLabel('Earliest date').fill(later);
  await page.getByRole('button', { name: 'Find times' }).click();
  const options = page.getByRole('article');
  await options.first().waitFor();
  const booked = page.waitForResponse((r) => r.url().endsWith('/api/bookings') && r.request().method() === 'POST');
  await options.first().getByRole('button', { name: 'Book this' }).click();
  expect((await booked).status()).toBe(201);
  await page.getByRole('heading', { level: 1, name: /Hollis Grant · Cut & finish/ }).waitFor();

  await page.getByRole('link', { name: 'Outbox (demo)' }).first().click();
  await page.getByRole('heading', { level: 1, name: 'Outbox (demo)' }).waitFor();
  // The send log lists the confirmation at once (queued, then sent by the worker), on each channel Hollis has.
  const row = page.getByRole('row').filter({ hasText: 'Confirmation (e-mail)' }).filter({ hasText: 'Booked: Cut & finish' }).first();
  // On a busy machine the page may have read the send log a moment before the row was committed: read it again.
  await expect.poll(async () => (await row.count()) > 0 || (await page.reload(), false), { timeout: 60_000, interval: 2000 }).toBe(true);
  expect(await row.textContent()).toMatch(/Queued|Sending|Sent/);
  await screenshot(page, 'outbox', true, false); // the top of the page: the full send log runs to thousands of pixels
  await page.context().close();
});
