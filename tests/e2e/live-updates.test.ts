import { DateTime } from 'luxon';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, connectBrowser, screenshot, signedInPage } from '../setup/browser';
import { liveStreamOpens } from '../setup/staff-pages';

// Live updates: the desk's day open in one browser page shows a booking made elsewhere (the owner's page, through
// the API) without a reload; a page whose stream is refused says so, and catches up when it is back.
// A date beyond the demo book (which runs a week ahead), so the other browser tests' days are left alone.

let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(() => browser.close());

const ZONE = 'America/Denver';
const PAUSED = 'Live updates paused — reconnecting…';

/** An open day (Tuesday to Saturday in the demo salon) at least `ahead` days from today. */
function openDay(ahead: number): string {
  let d = DateTime.now().setZone(ZONE).plus({ days: ahead });
  while (d.weekday === 1 || d.weekday === 7) d = d.plus({ days: 1 });
  return d.toISODate()!;
}

/** Books a blow-dry (no chemical, no skin test) on `date` through the API with the page's session: the booking's id. */
async function bookBlowDry(page: Page, date: string, clientIndex: number): Promise<string> {
  const get = async (path: string) => (await page.request.get(`${baseUrl()}${path}`)).json();
  const { clients } = await get('/api/clients');
  const services = (await get('/api/services')) as { services?: { id: string; name: string; stepPlan: unknown }[] };
  const list = Array.isArray(services) ? services : services.services!;
  const service = list.find((s: { name: string }) => s.name === 'Blow-dry')!;
  const client = clients[clients.length - 1 - clientIndex];
  const post = async (path: string, data: object) => {
    const { token } = await (await page.request.get(`${baseUrl()}/api/csrf`)).json();
    const res = await page.request.post(`${baseUrl()}${path}`, { data, headers: { 'X-CSRF-Token': token } });
    expect(res.status(), `${path}: ${await res.text()}`).toBeLessThan(300);
    return res.json();
  };
  const { options } = await post('/api/booking-options', {
    clientId: client.id,
    serviceId: service.id,
    stepPlan: service.stepPlan,
    stylistId: null,
    earliestDate: date,
  });
  const option = options.find((o: { sittings: { start: string }[] }) => DateTime.fromISO(o.sittings[0]!.start, { zone: ZONE }).toISODate() === date);
  const booking = await post('/api/bookings', {
    clientId: client.id,
    serviceId: service.id,
    stepPlan: service.stepPlan,
    stylistId: option.stylistId,
    start: option.sittings[0].start,
    idempotencyKey: crypto.randomUUID(),
  });
  return booking.id;
}

describe('screens that update themselves', () => {
  it("shows a booking made on another page in the desk's open day within seconds, and says when live updates are paused", async () => {
    const date = openDay(12);
    const desk = await signedInPage(browser, 'desk@demo.test', '/desk');
    const owner = await signedInPage(browser, 'owner@demo.test', '/owner');
    const dayRead = desk.waitForResponse((r) => new URL(r.url()).pathname === '/api/desk/day');
    const streamOpen = liveStreamOpens(desk);
    await desk.goto(`${baseUrl()}/desk?date=${date}`);
    // The clock starts once the page is listening: what this times is the change's way to an open screen.
    await Promise.all([dayRead, streamOpen]);

    const first = await bookBlowDry(owner, date, 0);
    const started = Date.now();
    await desk.locator(`a[href="/desk/bookings/${first}"]`).first().waitFor({ timeout: 5_000 });
    expect(Date.now() - started).toBeLessThan(5_000);
    expect(await desk.getByText(PAUSED).count()).toBe(0);

    // A phone-sized screen whose stream is refused: the banner says so, politely and in a live region.
    const phone = await browser.newContext({ viewport: { width: 375, height: 800 }, storageState: await desk.context().storageState() });
    const small = await phone.newPage();
    await small.route('**/api/events', (route) =>
      route.fulfill({ status: 503, contentType: 'application/json', body: '{"error":{"code":"BUSY","message":"Busy"}}' }),
    );
    await small.goto(`${baseUrl()}/desk?date=${date}`);
    const banner = small.getByRole('status').filter({ hasText: PAUSED });
    // Generous: the banner's code loads after the page, which takes a while on a busy machine.
    await banner.waitFor({ timeout: 15_000 });
    expect(await banner.textContent()).toBe(PAUSED);
    expect(await banner.getAttribute('aria-live')).toBe('polite');
    await screenshot(small, 'live-updates-paused-375', false, false);

    // A change while it is paused is caught up with once the stream is back.
    const second = await bookBlowDry(owner, date, 1);
    await small.unroute('**/api/events');
    await small.locator(`a[href="/desk/bookings/${second}"]`).first().waitFor({ timeout: 8_000 });
    await small.getByText(PAUSED).waitFor({ state: 'detached', timeout: 5_000 });
    await desk.locator(`a[href="/desk/bookings/${second}"]`).first().waitFor({ timeout: 5_000 });
    await screenshot(desk, 'live-updates-desk-1280', false, false);

    for (const id of [first, second]) {
      const { token } = await (await owner.request.get(`${baseUrl()}/api/csrf`)).json();
      await owner.request.post(`${baseUrl()}/api/bookings/${id}/cancel`, { data: { reason: 'Test booking' }, headers: { 'X-CSRF-Token': token } });
    }
    await Promise.all([phone.close(), desk.context().close(), owner.context().close()]);
  }, 90_000);
});
