import type { Browser, BrowserContext, Page } from 'playwright-core';
import { TEST_PASSWORD } from '../factories/user';
import { baseUrl, signInThroughPage } from './browser';
import { recordNotices } from './notices';

/**
 * A staff member signed in on a page in a browser context of its own, its live stream open. `notices`: the page may
 * show notifications and records each one raised; `prepare` runs on the context before the page opens (a test's clock).
 */
export async function staffPage(
  browser: Browser,
  email: string,
  home: string,
  options: { notices?: boolean; prepare?: (context: BrowserContext) => Promise<void> } = {},
): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  if (options.notices) await recordNotices(context);
  await options.prepare?.(context);
  const page = await context.newPage();
  const streamOpen = liveStreamOpens(page);
  await signInThroughPage(page, email, TEST_PASSWORD);
  await page.waitForURL(`${baseUrl()}${home}**`);
  await streamOpen;
  return page;
}

/**
 * Resolves once the page's live stream is answered (the server LISTENs by then). Staff screens listen to it; a test
 * that times how soon a change shows starts its clock once the page hears it. Call before the page loads.
 */
export const liveStreamOpens = (page: Page) => page.waitForResponse((r) => new URL(r.url()).pathname === '/api/events', { timeout: 30_000 });

/** An answer from the API to this page (a first write may be answered CSRF and sent again, as the api client does). */
export const postAnswer = (page: Page, path: string) =>
  page.waitForResponse(async (r) => r.url().includes(path) && r.request().method() === 'POST' && !(r.status() === 403 && (await r.text()).includes('"CSRF"')));

/** Opens the desk's Outbox and waits for a change notice by text to this number (`digits`: as the salon's country writes it). */
export async function changeNoticeInOutbox(page: Page, digits: RegExp): Promise<void> {
  await page.goto(`${baseUrl()}/desk/outbox`);
  const log = page.getByRole('region', { name: 'Sent messages' });
  await log
    .getByRole('row')
    .filter({ hasText: digits })
    .filter({ hasText: /Change notice \(SMS\)/ })
    .first()
    .waitFor();
}
