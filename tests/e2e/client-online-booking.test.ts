import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '@server/demo/demo-catalogue';
import { DateTime } from 'luxon';
import { setupPaths } from '../setup/setup-paths';
import { messagesApi } from '@shared/api/messages.api';
import { makeImage } from '../factories/image';
import { apiWrite, baseUrl, connectBrowser, expectAccessible, screenshot, signedInPage, signInThroughPage } from '../setup/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(() => browser.close());

/** Opens the day chip with the most free times (among those listed) and answers that day's times. */
async function openBusiestDay(page: Page) {
  const chips = page.getByRole('list', { name: 'Days with free times' }).getByRole('button');
  const counts = (await chips.evaluateAll((buttons) => buttons.map((b) => b.getAttribute('aria-label') ?? ''))).map((label) =>
    Number(/(\d+) free/.exec(label)?.[1] ?? 0),
  );
  await chips.nth(counts.indexOf(Math.max(...counts))).click();
  return page.getByRole('region', { name: /^Free times on / });
}

/**
 * The deposit step: "Pay deposit" leads to the payment fake's own hosted page (its own port, never Dwell's), where the
 * provider's published test cards are typed. Only this service's deposit is named on Dwell's page.
 */
async function openPaymentPage(page: Page) {
  await page.getByRole('heading', { name: 'Deposit' }).waitFor();
  await page.getByText('The deposit for Colour consultation is').waitFor();
  const salon = await (await page.request.get(`${baseUrl()}/api/public/salons/kestrel-and-pine`)).json();
  const others = salon.services.filter((s: { name: string; depositCents: number }) => s.depositCents > 0 && s.name !== 'Colour consultation');
  expect(others.length).toBeGreaterThan(0); // the menu has other deposits that this page once listed
  const text = await page.locator('main').innerText();
  expect(others.filter((s: { name: string }) => text.includes(s.name)).map((s: { name: string }) => s.name)).toEqual([]);
  expect(await page.getByLabel(/card number/i).count()).toBe(0); // no card field on Dwell's page
  await page.getByRole('button', { name: /^Pay deposit of \$25\.00/ }).click();
  await page.waitForURL((url) => url.origin !== new URL(baseUrl()).origin && url.pathname.startsWith('/pay/'));
  await page.getByRole('heading', { name: /Deposit for Colour consultation/ }).waitFor();
}

/** Types a test card into the fake's hosted page and pays. */
async function payWithCard(page: Page, number: string) {
  await page.getByLabel('Card number').fill(number);
  await page.getByLabel('Expiry (MM/YY)').fill('12/31');
  await page.getByLabel('Security code').fill('123');
  await page.getByRole('button', { name: /^Pay / }).click();
}

/**
 * Pays with a card that goes through, and follows the client back to Dwell's return page, which waits for the payment
 * service's confirmation (its first read is held back here so the waiting shows), then shows the booking.
 */
async function payAndWaitForBooking(page: Page, number: string, extraStep = false) {
  await page.route('**/api/public/holds/*', async (route) => (await new Promise((r) => setTimeout(r, 1_500)), route.continue()), { times: 1 });
  await payWithCard(page, number);
  if (extraStep) {
    await page.getByRole('heading', { name: 'Confirm this payment' }).waitFor();
    await screenshot(page, 'client-deposit-extra-step');
    await page.getByRole('button', { name: 'Confirm the payment' }).click();
  }
  await page.waitForURL(/\/me\/holds\/[^/]+\/paid$/);
  await page.getByText('Waiting for the payment to be confirmed…').waitFor();
  await page.getByRole('heading', { name: "You're booked" }).waitFor();
}

/** The declined test card first (said once on the fake's page, which offers another try), then the one that succeeds. */
async function payDeclinedThenPaid(page: Page) {
  await openPaymentPage(page);
  await payWithCard(page, '4000 0000 0000 0002');
  const declined = page.getByRole('alert').filter({ hasText: /declined/i });
  await declined.waitFor();
  const said = await declined.innerText();
  expect(said.match(/declined/gi)).toHaveLength(1);
  expect(said.match(/another card/gi)).toHaveLength(1);
  await screenshot(page, 'client-deposit-declined');
  await payAndWaitForBooking(page, '4242 4242 4242 4242');
}

/** The details step's one action; the reaction question must be answered (it starts unanswered). */
async function saveDetails(page: Page) {
  await page.getByRole('heading', { name: 'Your details' }).waitFor();
  const no = page.getByRole('group', { name: /ever reacted to hair colour/ }).getByLabel('No', { exact: true });
  if (!(await no.isChecked())) await no.check();
  await page.getByRole('button', { name: 'Save and continue' }).click();
  await page.getByRole('heading', { name: 'Before you pay' }).waitFor();
}

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
    // The busiest day: with 5-minute steps and two stylists it had over 200 buttons on one page (6,949 px tall).
    const day = await openBusiestDay(page);
    const shown = () => day.getByRole('button', { name: / with / }).count();
    // By part of the day, a short spread list each (at most 8) and "more"; any stylist: one button per start.
    expect(await day.getByRole('group').count()).toBeGreaterThan(0);
    expect(await shown()).toBeLessThanOrEqual(3 * 8);
    expect(await page.evaluate(() => document.documentElement.scrollHeight)).toBeLessThan(3000);
    const glance = await shown();
    const more = day.getByRole('button', { name: /^More (morning|afternoon|evening) times/ }).first();
    await more.click();
    expect(await shown()).toBeGreaterThan(glance);
    await day
      .getByRole('button', { name: /^Fewer / })
      .first()
      .click();
    await day
      .getByRole('button', { name: / with / })
      .first()
      .click();
    // The action stays in reach: the hold button is on screen, not at the end of a long list.
    const hold = page.getByRole('button', { name: 'Hold this time' });
    const holdBox = (await hold.boundingBox())!;
    expect(holdBox.y + holdBox.height).toBeLessThanOrEqual(812);
    await page.getByText(/^Your pick: /).waitFor();
    await expectAccessible(page);
    await screenshot(page, 'client-choose-time', true, false);
    await hold.click();

    await page.getByRole('heading', { name: 'Sign in to book' }).waitFor();
    await page
      .getByRole('link', { name: /Create an account|Sign up/ })
      .first()
      .click();
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
    await page
      .getByRole('group', { name: /ever reacted to hair colour/ })
      .getByLabel('No', { exact: true })
      .check();
    await page.getByRole('button', { name: 'Save and continue' }).click();
    await page.getByRole('heading', { name: 'Before you pay' }).waitFor();
    const history = await (await page.request.get(`${baseUrl()}/api/me/hair-history`)).json();
    expect(history.answers.currentColour).toBe('Faded copper over dark roots');
    for (const box of await page.getByRole('checkbox').all()) await box.check();
    await expectAccessible(page);
    await page.getByRole('button', { name: 'Accept and continue' }).click();

    await payDeclinedThenPaid(page);
    // The confirmation note says what the send log says (a text may wait for the salon's quiet hours).
    const bookingId = /\/me\/bookings\/([^/]+)\/booked/.exec(page.url())![1];
    const log = await (await page.request.get(`${baseUrl()}/api/me/bookings/${bookingId}/confirmation`)).json();
    const note = await page
      .getByRole('status')
      .filter({ hasText: /confirmation/ })
      .innerText();
    const text = log.sends.find((x: { channel: string }) => x.channel === 'sms');
    expect(note).toMatch(text.status === 'waiting' ? /confirmation text goes at/ : /text/);
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
    // Moving uses the same picker: short lists by part of the day, and its action in reach on the phone.
    await page.getByRole('button', { name: 'Move booking' }).first().click();
    const moveDay = await openBusiestDay(page);
    expect(await moveDay.getByRole('button', { name: / with / }).count()).toBeLessThanOrEqual(3 * 8);
    await moveDay
      .getByRole('button', { name: / with / })
      .first()
      .click();
    const moveBox = (await page.getByRole('button', { name: 'Move to this time' }).boundingBox())!;
    expect(moveBox.y + moveBox.height).toBeLessThanOrEqual(812);
    await page.getByRole('button', { name: 'Keep the current time' }).click();
    await page.getByRole('button', { name: 'Cancel booking' }).first().click();
    await page
      .getByText(/deposit is (refunded|kept)/)
      .first()
      .waitFor(); // the rule is shown before confirming
    const [cancelled] = await Promise.all([
      page.waitForResponse((r) => r.url().includes('/cancel') && r.request().method() === 'POST'),
      page.getByRole('button', { name: 'Confirm cancellation' }).click(),
    ]);
    expect(cancelled.status()).toBe(200);
    // The cancelled booking moves to its own list, with what became of the deposit.
    await page
      .getByRole('region', { name: 'Cancelled' })
      .getByText(/deposit .+, (refunded|kept by the salon)/)
      .first()
      .waitFor();
    await expectAccessible(page);
    await screenshot(page, 'client-cancelled', false);
    await page.goto(`${baseUrl()}/me/hair`);
    await page.getByRole('heading', { level: 1, name: 'Hair history and photos' }).waitFor();
    expect(await page.getByLabel('Your hair colour now').inputValue()).toBe('Faded copper over dark roots');
    await expectAccessible(page);
    await screenshot(page, 'client-hair-history', true);
    // Leaving with unsaved answers asks first; staying keeps them.
    await page.getByLabel('Your hair colour now').fill('Copper, now fading to orange');
    const asked = new Promise<string>((resolve) =>
      page.once('dialog', (d) => {
        resolve(d.message());
        void d.dismiss();
      }),
    );
    await page.getByRole('link', { name: 'My bookings' }).first().click();
    expect(await asked).toMatch(/not saved yet/);
    expect(page.url()).toMatch(/\/me\/hair$/);
    expect(await page.getByLabel('Your hair colour now').inputValue()).toBe('Copper, now fading to orange');
    await context.close();
  });
});

describe('a signed-in client at a desk-size screen', () => {
  it('sees their photos and no sign-in step, is offered only stylists who do the service, holds one time at a time (resumed or released from My bookings), and is told when a text waits for quiet hours', async () => {
    // Quiet hours from an hour ago to two hours ahead, salon time, so the confirmation text must wait (put back after).
    const owner = await signedInPage(browser, 'owner@demo.test', '/owner');
    const settings = await (await owner.request.get(`${baseUrl()}${setupPaths.salon}`)).json();
    const now = DateTime.now().setZone('America/Denver');
    const quiet = { quietFrom: now.minus({ hours: 1 }).toFormat('HH:mm'), quietTo: now.plus({ hours: 2 }).toFormat('HH:mm') };
    expect(await apiWrite(owner, 'PUT', setupPaths.salon, { ...settings, ...quiet })).toBe(200);
    try {
      const page = await signedInPage(browser, 'client@demo.test', '/me');
      const salon = await (await page.request.get(`${baseUrl()}/api/public/salons/kestrel-and-pine`)).json();
      const consultation = salon.services.find((s: { name: string }) => s.name === 'Colour consultation');
      // Texts and e-mail for this client (the demo gives some clients e-mail only, depending on the order it makes them in).
      const prefs = await (await page.request.get(`${baseUrl()}${messagesApi.myPreferences.path}`)).json();
      expect(
        await apiWrite(page, 'PUT', messagesApi.myPreferences.path, { phone: prefs.phone, messageChannel: 'both', marketingOptIn: prefs.marketingOptIn }),
      ).toBe(200);
      const bookPath = `${baseUrl()}/salon/kestrel-and-pine/book?service=${consultation.id}`;

      // A photo from before this booking.
      await page.goto(`${baseUrl()}/me/hair`);
      await page
        .getByRole('region', { name: 'Your hair now' })
        .getByLabel('Add photos')
        .setInputFiles({ name: 'now.jpg', mimeType: 'image/jpeg', buffer: await makeImage('jpeg') });
      await page.getByText('Photo added.').waitFor();

      await page.goto(bookPath);
      await page.getByRole('heading', { name: 'Choose a time' }).waitFor();
      // Signed in already: no "Sign in" step in the progress list.
      expect(await page.getByRole('navigation', { name: 'Booking steps' }).getByRole('listitem').allInnerTexts()).toEqual([
        '1. Choose a time',
        '2. Your details',
        '3. Before you pay',
        '4. Deposit',
      ]);
      // The consultation is colour work: Lee Tanaka cuts only (demo catalogue) and is not offered.
      expect(await page.getByLabel('Stylist').locator('option').allInnerTexts()).toEqual(['Any stylist', 'Ana Moreno', 'Marcus Bell']);
      await (
        await openBusiestDay(page)
      )
        .getByRole('button', { name: / with / })
        .first()
        .click();
      await screenshot(page, 'client-choose-time-desktop');
      await page.getByRole('button', { name: 'Hold this time' }).click();
      await page.getByRole('heading', { name: 'Your details' }).waitFor();
      // The photo from before is listed here too (this step once said "No photos yet").
      await page.getByRole('list', { name: 'Your hair now' }).getByRole('img').first().waitFor();
      await screenshot(page, 'client-details-photos');

      // Starting again in another tab offers the time already held instead of holding a second one.
      const tab = await page.context().newPage();
      await tab.goto(bookPath);
      await tab.getByRole('heading', { name: 'You already have a time held' }).waitFor();
      expect(await tab.getByRole('button', { name: 'Hold this time' }).count()).toBe(0);
      // My bookings: waiting for payment with resume and release; not listed among the bookings as "Held".
      await tab.goto(`${baseUrl()}/me`);
      const waiting = tab.getByRole('region', { name: 'Waiting for payment' });
      await waiting.getByRole('button', { name: 'Resume booking' }).waitFor();
      expect(await tab.getByRole('region', { name: 'Upcoming' }).getByText('Held', { exact: true }).count()).toBe(0);
      await expectAccessible(tab);
      await screenshot(tab, 'client-waiting-for-payment', true);
      // Resume: back at the step reached (the details), then again after moving on (the cautions).
      await waiting.getByRole('button', { name: 'Resume booking' }).click();
      await saveDetails(tab);
      await tab.goto(`${baseUrl()}/me`);
      await waiting.getByRole('button', { name: 'Resume booking' }).click();
      await tab.getByRole('heading', { name: 'Before you pay' }).waitFor();

      // Release: the time is free for others at once, and the first tab finds it gone.
      await tab.goto(`${baseUrl()}/me`);
      const [held] = (await (await tab.request.get(`${baseUrl()}/api/me/holds`)).json()).holds;
      await waiting.getByRole('button', { name: 'Release this time' }).click();
      await waiting.waitFor({ state: 'detached' });
      const date = DateTime.fromISO(held.start, { zone: 'America/Denver' }).toISODate();
      const free = await (
        await tab.request.get(`${baseUrl()}/api/public/salons/kestrel-and-pine/availability?serviceId=${consultation.id}&from=${date}`)
      ).json();
      expect(free.times.map((x: { start: string }) => Date.parse(x.start))).toContain(Date.parse(held.start));
      await tab.close();
      await page.reload();
      await page.getByRole('button', { name: 'Pick a time again' }).click();

      await (
        await openBusiestDay(page)
      )
        .getByRole('button', { name: / with / })
        .first()
        .click();
      await page.getByRole('button', { name: 'Hold this time' }).click();
      await saveDetails(page);
      for (const box of await page.getByRole('checkbox').all()) await box.check();
      await page.getByRole('button', { name: 'Accept and continue' }).click();
      // The card that asks its holder to confirm: an extra step on the payment service's page, then booked.
      await openPaymentPage(page);
      await payAndWaitForBooking(page, '4000 0025 0000 3155', true);
      // The text waits for the end of quiet hours and the page says when (salon time), not that it was sent.
      const note = await page
        .getByRole('status')
        .filter({ hasText: /confirmation/ })
        .innerText();
      const until = DateTime.fromISO(now.plus({ hours: 2 }).toISO()!, { zone: 'America/Denver' }).startOf('minute');
      expect(note).toContain(`The confirmation text goes at ${until.toLocaleString(DateTime.TIME_SIMPLE)}`);
      expect(note).toMatch(/the salon sends no texts between/);
      expect(note).not.toMatch(/by e-mail and text/);
      await screenshot(page, 'client-booked-quiet-hours');
      await page.context().close();
    } finally {
      expect(await apiWrite(owner, 'PUT', setupPaths.salon, settings)).toBe(200);
      await owner.context().close();
    }
  });
});
