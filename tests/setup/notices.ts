import type { BrowserContext, Page } from 'playwright-core';
import { baseUrl } from './browser';

export type RaisedNotice = { title: string; body: string };

/** Lets the context's pages show notifications (as if the person allowed them) and records each one raised. */
export async function recordNotices(context: BrowserContext): Promise<void> {
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

/** The first notification the page raised with this title, once it has been raised. */
export async function noticeRaised(page: Page, title: string): Promise<RaisedNotice> {
  const found = await page.waitForFunction(
    (t) => (window as unknown as { raisedNotices: RaisedNotice[] }).raisedNotices.find((n) => n.title === t) ?? false,
    title,
  );
  return (await found.jsonValue()) as RaisedNotice;
}
