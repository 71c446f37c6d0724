import { DateTime } from 'luxon';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, connectBrowser, screenshot, signedInPage } from '../setup/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(() => browser.close());

const signedIn = (email: string, path: string) => signedInPage(browser, email, path);

const shot = (page: Page, name: string) => screenshot(page, name, true);

describe('front desk', () => {
  it('books the two-sitting colour correction from the calendar in under a minute', async () => {
    const page = await signedIn('desk@demo.test', '/desk');
    await page.getByRole('heading', { level: 1, name: "Today's book" }).waitFor();
    await shot(page, 'desk-day');
    const started = Date.now();
    await page.getByRole('link', { name: 'Book a service' }).first().click();
    await page.getByRole('heading', { level: 1, name: 'Book a service' }).waitFor();
    await page.getByLabel('Client').fill('Priya');
    await page
      .getByRole('list', { name: 'Matching clients' })
      .getByRole('button', { name: /Priya Raman/ })
      .click();
    await page.getByLabel('Service').selectOption({ label: 'Colour correction (two sittings)' });
    const nextWeek = DateTime.now().setZone('America/Denver').plus({ days: 7 }).toISODate()!;
    await page.getByLabel('Earliest date').fill(nextWeek);
    await page.getByRole('button', { name: 'Find times' }).click();
    const options = page.getByRole('article');
    await options.first().waitFor();
    expect(await options.count()).toBeGreaterThan(1);
    await shot(page, 'desk-options');
    await options.first().getByRole('button', { name: 'Book this' }).click();
    await page.getByRole('heading', { level: 1, name: 'Priya Raman · Colour correction (two sittings)' }).waitFor();
    await page
      .getByText(/Sitting 2 of 2/i)
      .first()
      .waitFor();
    const seconds = (Date.now() - started) / 1000;
    expect(seconds).toBeLessThan(60);
    await page.getByRole('heading', { name: 'History' }).waitFor();
    await shot(page, 'desk-booking');
    await page.context().close();
  });
});

describe('stylist', () => {
  it('fills a hands-free window with a standby client from "My day"', async () => {
    const page = await signedIn('ana@demo.test', '/stylist');
    // The first coming open day with a window that has a fit and a standby client, asked the way the page does.
    let date = '';
    for (let d = 1; d <= 7 && !date; d++) {
      const day = DateTime.now().setZone('America/Denver').plus({ days: d }).toISODate()!;
      const res = await page.request.get(`${baseUrl()}/api/windows?date=${day}`);
      const windows = (await res.json()).windows as { fits: unknown[]; standby: unknown[] }[];
      if (windows.some((w) => w.fits.length && w.standby.length)) date = day;
    }
    expect(date).not.toBe('');
    await page.goto(`${baseUrl()}/stylist?date=${date}`);
    await page.getByRole('heading', { level: 1, name: 'My day' }).waitFor();
    await page.getByRole('heading', { name: 'Hands-free windows' }).waitFor();
    await shot(page, 'stylist-day');
    const card = page
      .getByRole('article', { name: /^Hands free/ })
      .filter({ hasText: /Standby: (?!nobody)/ })
      .first();
    await card.getByRole('button', { name: 'Fill window' }).click();
    const bookButton = card.getByRole('button', { name: /^Book (?!walk-in)/ }).first();
    const name = ((await bookButton.textContent()) ?? '').replace(/^Book /, '').trim();
    // If this journey fails, the log says whether the page broke or the API refused.
    page.on('pageerror', (e) => console.log('page error:', e.message));
    const [response] = await Promise.all([page.waitForResponse((r) => r.url().includes('/api/windows/fill')), bookButton.click()]);
    expect(response.status()).toBe(201);
    expect((await response.json()).client.name).toBe(name);
    await page.getByText(new RegExp(`Booked ${name}`)).waitFor(); // the notice stays after the window leaves the list
    await page.context().close();
  });
});
