import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb, createPool } from '@server/db/database';
import { insertRunningLateDay } from '../factories/running-late-day';
import { TEST_PASSWORD } from '../factories/user';
import { baseUrl, connectBrowser, screenshot, signInThroughPage } from '../setup/browser';

// Two browsers: the stylist starts a client's sitting late on My day, which pushes its developing time and rinse into
// the next client's cut; the desk's open day shows the conflict by itself within 2 s, raises a notification, and the
// desk hands the next client over to a free stylist with one click; the client's message is in the Outbox. A salon of
// its own (open around the clock, at about midday in its zone) keeps the demo salon as loaded for the other tests.

const pool = createPool(inject('databaseUrl'));
const db = createDb(pool);
let browser: Browser;
const people = { desk: '', stylist: '' };
const LATER_PHONE = '+19705550188';
// The Outbox writes numbers as people do in the salon's country (one format policy), e.g. (970) 555-0188.
const LATER_PHONE_TEXT = /970\D{0,2}555\D?0188/;

beforeAll(async () => {
  browser = await connectBrowser();
  const day = await insertRunningLateDay(db, LATER_PHONE);
  Object.assign(people, { desk: day.deskEmail, stylist: day.stylistEmail });
});

afterAll(async () => {
  await browser.close();
  await db.destroy();
});

/** A signed-in page in a browser context of its own; the desk's may show notifications, and records each one raised. */
async function personAt(email: string, home: string, notifications = false): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  if (notifications) {
    await context.grantPermissions(['notifications'], { origin: baseUrl() });
    await context.addInitScript(() => {
      const raised: Array<{ title: string; body: string }> = [];
      const Real = window.Notification;
      class Recorded extends Real {
        constructor(title: string, options?: NotificationOptions) {
          super(title, options);
          raised.push({ title, body: options?.body ?? '' });
        }
      }
      Object.defineProperty(Recorded, 'permission', { get: () => Real.permission });
      (window as unknown as { Notification: typeof Notification }).Notification = Recorded as unknown as typeof Notification;
      (window as unknown as { raisedNotices: typeof raised }).raisedNotices = raised;
    });
  }
  const page = await context.newPage();
  await signInThroughPage(page, email, TEST_PASSWORD);
  await page.waitForURL(`${baseUrl()}${home}**`);
  return page;
}

/** An answer from the API to this page (a first write may be answered CSRF and sent again, as the api client does). */
const answer = (page: Page, path: string) =>
  page.waitForResponse(async (r) => r.url().includes(path) && r.request().method() === 'POST' && !(r.status() === 403 && (await r.text()).includes('"CSRF"')));

describe('running late', () => {
  it('a late start on My day reaches the desk’s open day within 2 s, with a notification; the desk hands the next client over', async () => {
    const desk = await personAt(people.desk, '/desk', true);
    const panel = desk.getByRole('region', { name: 'Running late' });
    await panel.getByText('Nothing is running late.').waitFor();

    const stylist = await personAt(people.stylist, '/stylist');
    const card = stylist.getByRole('article', { name: /Robin Vale/ });
    const start = card.getByRole('button', { name: 'Start step 1: Apply gloss' });
    const [started] = await Promise.all([answer(stylist, '/steps/1/start'), start.click()]);
    expect(started.status(), await started.text()).toBe(200);
    const tappedAt = Date.now();
    // The stylist is told what the late start means, and that the desk has the fixes.
    await card.getByText(/into Sasha Lind’s .*The front desk has the fixes\./).waitFor();

    const conflict = panel.getByRole('article', { name: 'Running late: Sasha Lind' });
    await conflict.waitFor({ timeout: 2_000 });
    const seenAfter = Date.now() - tappedAt;
    expect(seenAfter).toBeLessThanOrEqual(2_000);
    await conflict.getByText(/^Robin Vale’s sitting now runs \d+ min into Sasha Lind’s .*: both need .*’s hands\.$/).waitFor();
    await desk.waitForFunction(() => (window as unknown as { raisedNotices: unknown[] }).raisedNotices.length > 0);
    const notices = await desk.evaluate(() => (window as unknown as { raisedNotices: Array<{ title: string; body: string }> }).raisedNotices);
    expect(notices[0]).toMatchObject({ title: 'Running late: Sasha Lind' });
    expect(notices[0]!.body).toMatch(/^Robin Vale’s sitting now runs/);
    await screenshot(desk, 'running-late-desk', true, false);

    const handOver = conflict.getByRole('button', { name: /^Hand Sasha Lind over to / });
    const [applied] = await Promise.all([answer(desk, '/replan-fix'), handOver.click()]);
    expect(applied.status(), await applied.text()).toBe(200);
    await panel.getByText(/^Hand Sasha Lind over to .*: done\.$/).waitFor();
    await panel.getByText('Nothing is running late.').waitFor();
    await stylist.context().close();

    await desk.goto(`${baseUrl()}/desk/outbox`);
    const log = desk.getByRole('region', { name: 'Sent messages' });
    await log
      .getByRole('row')
      .filter({ hasText: LATER_PHONE_TEXT })
      .filter({ hasText: /Change notice \(SMS\)/ })
      .first()
      .waitFor();
    await desk.context().close();
  });
});
