import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { DateTime } from 'luxon';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiWrite, baseUrl, connectBrowser, expectAccessible, screenshot, screenshotDir, signedInPage, signInThroughPage } from '../setup/browser';
import { DEMO_PASSWORD } from '@server/demo/demo-catalogue';

// The desk's takings in the demo salon: a cash deposit taken and part of it refunded from the booking page, then the
// day's takings, the cash counted, the day closed and its CSV downloaded; the page at phone width.

let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(() => browser.close());

type Booking = { id: string; status: string; deposit: { status: string; dueCents: number } };
const getJson = async (page: Page, path: string) => (await page.request.get(`${baseUrl()}${path}`)).json();
const today = () => DateTime.now().setZone('America/Denver').toISODate()!;

describe('takings at the desk', () => {
  it('a refund from the booking page shows in the takings; the desk counts the cash, closes the day and downloads the CSV', async () => {
    const desk = await signedInPage(browser, 'desk@demo.test', '/desk');
    // A day closed by an earlier run of this test on the same database is reopened by the owner first.
    if ((await getJson(desk, `/api/desk/takings?date=${today()}`)).close) {
      const owner = await signedInPage(browser, 'owner@demo.test', '/owner');
      expect(await apiWrite(owner, 'POST', '/api/desk/takings/reopen', { date: today() })).toBe(200);
      await owner.context().close();
    }
    // The last booking still to come whose deposit is due (the deposits test uses the first ones).
    const { bookings } = (await getJson(desk, `/api/desk/week?date=${today()}`)) as { bookings: Booking[] };
    const due = bookings.filter((b) => b.status === 'booked' && b.deposit.status === 'due').at(-1)!;
    expect(await apiWrite(desk, 'POST', `/api/bookings/${due.id}/deposit/taken`, { method: 'cash' })).toBe(200);

    await desk.goto(`${baseUrl()}/desk/bookings/${due.id}`);
    const money = desk.getByRole('region', { name: 'Payments and refunds' });
    const refund = money.getByRole('form', { name: 'Refund a payment' });
    await refund.getByLabel(/^Amount/).fill('5.00');
    await refund.getByLabel('Reason').fill('Fringe trim not done');
    await refund.getByRole('button', { name: 'Refund' }).click();
    await money.getByText('Refund recorded; the client is told.').waitFor();
    await money.getByText('Fringe trim not done').waitFor();
    await money.getByText('−$5.00').waitFor();

    await desk.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Takings' }).click();
    await desk.getByRole('heading', { level: 1, name: 'Takings' }).waitFor();
    const takings = await getJson(desk, `/api/desk/takings?date=${today()}`);
    expect(takings.byMethod.cash.refundedCents).toBeGreaterThanOrEqual(500);
    const byMethod = desk.getByRole('region', { name: 'Takings by method' });
    await byMethod.getByRole('row', { name: /^Cash/ }).waitFor();
    await expectAccessible(desk);

    // The drawer holds $1.00 less than the payments say (ISO 4217 USD: 100 cents).
    const counted = (takings.expectedCashCents - 100) / 100;
    const cash = desk.getByRole('region', { name: 'Cash and the close' });
    await cash.getByLabel('Cash counted (USD)').fill(counted.toFixed(2));
    await cash.getByLabel('Note (optional)').fill('Float of $100.00 left in the drawer');
    await cash.getByRole('button', { name: 'Close the day' }).click();
    await cash.getByText(/Day closed: counted/).waitFor();
    await cash.getByText('$1.00 short').waitFor();
    await screenshot(desk, 'desk-takings', true);

    const [download] = await Promise.all([desk.waitForEvent('download'), desk.getByRole('button', { name: 'Download CSV' }).click()]);
    expect(download.suggestedFilename()).toBe(`dwell-takings-${today()}.csv`);
    // The browser runs apart from the test: the file is copied here first.
    const file = join(screenshotDir, `takings-${Date.now()}.csv`);
    await download.saveAs(file);
    const csv = readFileSync(file, 'utf8');
    expect(csv.split('\r\n')[0]).toBe('When,What,Method,Amount (USD),Client,Stylist,Note');
    expect(csv).toContain('Fringe trim not done');
    expect(csv).toContain(`${today()},cash difference,cash,-1,`);

    // A second close is refused; the page says so only to someone who tries it through the API.
    expect(await apiWrite(desk, 'POST', '/api/desk/takings/close', { date: today(), countedCashCents: 0 })).toBe(409);
    await desk.context().close();
  });

  it('works at 375 px: nothing wider than the screen', async () => {
    const context = await browser.newContext({ viewport: { width: 375, height: 812 }, isMobile: true, hasTouch: true });
    const phone = await context.newPage();
    await signInThroughPage(phone, 'desk@demo.test', DEMO_PASSWORD);
    await phone.waitForURL(`${baseUrl()}/desk**`);
    await phone.goto(`${baseUrl()}/desk/takings`);
    await phone.getByRole('heading', { level: 1, name: 'Takings' }).waitFor();
    // Wide tables scroll inside their own region; the page itself never scrolls sideways.
    expect(await phone.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
    await expectAccessible(phone);
    await screenshot(phone, 'desk-takings-375');
    await context.close();
  });
});
