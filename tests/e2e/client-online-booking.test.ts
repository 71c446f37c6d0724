import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/demo/demo-catalogue';
import { baseUrl, connectBrowser, expectAccessible, screenshot, signInThroughPage } from '../setup/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(() => browser.close());

describe('a new client on a phone', () => {
  it('books and pays a consultation, gets the e-mail, then cancels', async () => {
    const context = await browser.newContext({ viewport: { width: 375, height: 812 }, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    const email = `new.client.${Date.now()}@example.test`;

    await page.goto(`${baseUrl()}/sign-in`);
    await page.getByRole('link', { name: /services and book online/ }).click();
    await page.getByRole('heading', { level: 1, name: 'Kestrel & Pine Hair Studio' }).waitFor();
    await expectAccessible(page);
    await screenshot(page, 'client-salon-page', true);
    await page.getByRole('link', { name: 'Book Colour consultation' }).click();

    await page.getByRole('heading', { name: 'Choose a time' }).waitFor();
    await page.getByRole('list', { name: 'Days with free times' }).getByRole('button').nth(1).click();
    await page.getByRole('button', { name: / with / }).first().click();
    await expectAccessible(page);
    await screenshot(page, 'client-choose-time', true);
    await page.getByRole('button', { name: 'Hold this time' }).click();

    await page.getByRole('heading', { name: 'Sign in to book' }).waitFor();
    await page.getByRole('link', { name: /Create an account|Sign up/ }).first().click();
    await page.getByLabel('Name').fill('Robin Vale');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Mobile phone').fill('+1 970 555 0123');
    await page.getByLabel('Password').fill('meadow-lantern-copper-9');
    await page.getByRole('form', { name: 'Create your account' }).getByRole('button').last().click();

    await page.getByRole('heading', { name: 'Your details' }).waitFor();
    // Answers typed here are saved by the step's one action (they were once lost when "Continue" skipped the save).
    await page.getByLabel('Your hair colour now').fill('Faded copper over dark roots');
    // The reaction question starts unanswered and must be answered before moving on.
    await page.getByRole('button', { name: 'Save and continue' }).click();
    await page.getByText('Choose an answer').first().waitFor();
    await page.getByRole('group', { name: /ever reacted to hair colour/ }).getByLabel('No', { exact: true }).check();
    await page.getByRole('button', { name: 'Save and continue' }).click();
    await page.getByRole('heading', { name: 'Before you pay' }).waitFor();
    const history = await (await page.request.get(`${baseUrl()}/api/me/hair-history`)).json();
    expect(history.answers.currentColour).toBe('Faded copper over dark roots');
    for (const box of await page.getByRole('checkbox').all()) await box.check();
    await expectAccessible(page);
    await page.getByRole('button', { name: 'Accept and continue' }).click();

    await page.getByRole('heading', { name: 'Deposit' }).waitFor();
    const fillCard = async (number: string) => {
      await page.getByLabel('Card number').fill(number);
      await page.getByLabel('Month (MM)').fill('12');
      await page.getByLabel('Year (YYYY)').fill('2031');
      await page.getByLabel('CVC').fill('123');
      await page.getByRole('button', { name: 'Pay deposit' }).click();
    };
    // The payment fake's declined test card first (the provider's published test numbers).
    await fillCard('4000 0000 0000 0002');
    await page.getByText(/declined/i).first().waitFor();
    await fillCard('4242 4242 4242 4242');
    await page.getByRole('heading', { name: "You're booked" }).waitFor();
    await expectAccessible(page);
    await screenshot(page, 'client-booked', true);

    // The confirmation e-mail reached the local SMTP fake, with the calendar file; the desk reads it in the Outbox.
    expect((await page.request.get(`${baseUrl()}/api/dev/mailbox`)).status()).toBe(403); // not for clients
    const desk = await browser.newContext();
    const deskPage = await desk.newPage();
    await signInThroughPage(deskPage, 'desk@demo.test', DEMO_PASSWORD);
    await deskPage.waitForURL(`${baseUrl()}/desk**`);
    const box = await (await deskPage.request.get(`${baseUrl()}/api/dev/mailbox`)).json();
    const confirmation = box.messages.find((m: { to: string }) => m.to === email);
    expect(confirmation.subject).toMatch(/^Booked: Colour consultation/);
    expect(confirmation.attachments.map((a: { filename: string }) => a.filename)).toContain('booking.ics');
    await desk.close();
    await page.goto(`${baseUrl()}/me`);
    await page.getByRole('heading', { level: 1, name: 'My bookings' }).waitFor();
    await page.getByRole('button', { name: 'Cancel booking' }).first().click();
    await page.getByText(/deposit is (refunded|kept)/).first().waitFor(); // the rule is shown before confirming
    const [cancelled] = await Promise.all([
      page.waitForResponse((r) => r.url().includes('/cancel') && r.request().method() === 'POST'),
      page.getByRole('button', { name: 'Confirm cancellation' }).click(),
    ]);
    expect(cancelled.status()).toBe(200);
    // The cancelled booking moves to its own list, with what became of the deposit.
    await page.getByRole('region', { name: 'Cancelled' }).getByText(/deposit .+, (refunded|kept by the salon)/).first().waitFor();
    await expectAccessible(page);
    await screenshot(page, 'client-cancelled', false);
    await page.goto(`${baseUrl()}/me/hair`);
    await page.getByRole('heading', { level: 1, name: 'Hair history and photos' }).waitFor();
    expect(await page.getByLabel('Your hair colour now').inputValue()).toBe('Faded copper over dark roots');
    await expectAccessible(page);
    await screenshot(page, 'client-hair-history', true);
    // Leaving with unsaved answers asks first; staying keeps them.
    await page.getByLabel('Your hair colour now').fill('Copper, now fading to orange');
    const asked = new Promise<string>((resolve) => page.once('dialog', (d) => { resolve(d.message()); void d.dismiss(); }));
    await page.getByRole('link', { name: 'My bookings' }).first().click();
    expect(await asked).toMatch(/not saved yet/);
    expect(page.url()).toMatch(/\/me\/hair$/);
    expect(await page.getByLabel('Your hair colour now').inputValue()).toBe('Copper, now fading to orange');
    await context.close();
  });
});
