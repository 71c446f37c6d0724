import { DateTime } from 'luxon';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '@server/demo/demo-catalogue';
import { baseUrl, connectBrowser, screenshot, seriousFindings, signInThroughPage } from '../setup/browser';

// Every page of every role, at a desktop and a phone width (the day-of-service pages in a day of their own, in
// accessibility-walk-day-of-service.test.ts): its own title, nothing wider than the screen, no console warnings or
// errors (React Router's warnings and refused fonts among them), and axe-core's automated WCAG 2.0, 2.1 and 2.2 A
// and AA checks (Deque's rules) finding nothing serious or critical.

let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(() => browser.close());

const WIDTHS = [1280, 375];
const ZONE = 'America/Denver';

/** `shot`: also a screenshot for docs/screenshots, named with the width (the top of the page only: some run long). */
type Visit = { path: string; heading: string | RegExp; shot?: string };
type Role = { name: string; email: string | null; home: string; pages: (page: Page) => Promise<Visit[]> };

const getJson = async (page: Page, path: string) => (await page.request.get(`${baseUrl()}${path}`)).json();

/** A client and a booking of the demo book, for the pages that show one. */
async function deskRecords(page: Page): Promise<Visit[]> {
  const { clients } = (await getJson(page, '/api/clients?q=Priya')) as { clients: { id: string; name: string }[] };
  const date = DateTime.now().setZone(ZONE).toISODate();
  let booking: { id: string } | undefined;
  for (let d = 0; d < 7 && !booking; d++) {
    const day = DateTime.fromISO(date!).plus({ days: d }).toISODate();
    booking = ((await getJson(page, `/api/desk/day?date=${day}`)) as { bookings: { id: string }[] }).bookings[0];
  }
  const client = clients[0];
  if (!client || !booking) throw new Error('the demo salon has no client or booking for this walk');
  return [
    { path: `/desk/clients/${client.id}`, heading: client.name, shot: 'desk-client-card' },
    { path: `/desk/bookings/${booking.id}`, heading: /·/ },
  ];
}

const roles: Role[] = [
  {
    name: 'a visitor',
    email: null,
    home: '/sign-in',
    pages: async () => [
      { path: '/sign-in', heading: 'Sign in' },
      { path: '/sign-up', heading: 'Create your account' },
      { path: '/forgot-password', heading: 'Reset your password' },
      { path: '/salon/kestrel-and-pine', heading: 'Kestrel & Pine Hair Studio', shot: 'public-salon-page' },
      { path: '/salon/kestrel-and-pine/book', heading: 'Choose a service first' },
      { path: '/no-such-page', heading: 'Page not found' },
    ],
  },
  {
    name: 'a client',
    email: 'client@demo.test',
    home: '/me',
    pages: async () => [
      { path: '/me', heading: 'My bookings' },
      { path: '/me/hair', heading: 'Hair history and photos' },
      { path: '/salon/kestrel-and-pine', heading: 'Kestrel & Pine Hair Studio' },
    ],
  },
  { name: 'a stylist', email: 'ana@demo.test', home: '/stylist', pages: async () => [{ path: '/stylist', heading: 'My day' }] },
  {
    name: 'the front desk',
    email: 'desk@demo.test',
    home: '/desk',
    pages: async (page) => [
      { path: '/desk', heading: "Today's book" },
      { path: '/desk/week', heading: 'Week of all stylists' },
      { path: '/desk/book', heading: 'Book a service' },
      { path: '/desk/standby', heading: 'Standby list', shot: 'desk-standby' },
      { path: '/desk/outbox', heading: 'Outbox (demo)' },
      { path: '/desk/utilisation', heading: 'Chair use' },
      { path: '/desk/takings', heading: 'Takings' },
      ...(await deskRecords(page)),
    ],
  },
  {
    name: 'the owner',
    email: 'owner@demo.test',
    home: '/owner',
    pages: async (page) => {
      const { services } = (await getJson(page, '/api/owner/setup/services')) as { services: { id: string; name: string }[] };
      return [
        { path: '/owner', heading: 'Salon overview' },
        { path: '/owner/utilisation', heading: 'Utilisation', shot: 'owner-utilisation-top' },
        { path: '/owner/setup', heading: 'Set-up' },
        { path: '/owner/setup/staff', heading: 'Set-up' },
        { path: '/owner/setup/chairs-and-basins', heading: 'Set-up' },
        { path: '/owner/setup/services', heading: 'Set-up' },
        { path: `/owner/setup/services/${services[0]!.id}`, heading: services[0]!.name },
        { path: '/owner/setup/quote-prices', heading: 'Set-up' },
        { path: '/owner/setup/products', heading: 'Set-up' },
        { path: '/owner/setup/follow-up-rules', heading: 'Set-up', shot: 'owner-follow-up-rules' },
      ];
    },
  },
];

/** A page of this role at this width, signed in (or not), with every console warning and error kept. */
async function open(role: Role, width: number): Promise<{ context: BrowserContext; page: Page; warnings: string[] }> {
  const context = await browser.newContext({ viewport: { width, height: 900 } });
  const page = await context.newPage();
  const warnings: string[] = [];
  page.on('console', (m) => {
    // Warnings, and errors other than an answer's status (a signed-out visitor's session check is a 401 by design):
    // a style or font the content security policy refuses is logged as an error.
    if (m.type() === 'warning' || (m.type() === 'error' && !m.text().startsWith('Failed to load resource'))) warnings.push(m.text().slice(0, 300));
  });
  if (role.email) {
    await signInThroughPage(page, role.email, DEMO_PASSWORD);
    await page.waitForURL(`${baseUrl()}${role.home}**`);
  }
  return { context, page, warnings };
}

// The walks only read, each in a browser context of its own, so two run at once (the e2e project's maxConcurrency):
// much of a walk is waiting on the server and the page's network, which the other walk's axe run fills.
describe.concurrent('every page, as each role, at both widths', () => {
  for (const role of roles)
    for (const width of WIDTHS)
      it(`${role.name} at ${width} px: titled, quiet in the console, and without serious or critical axe findings`, async ({ expect }) => {
        const { context, page, warnings } = await open(role, width);
        // The root only sends people on to their home (React Router warned when its leaf had no element).
        await page.goto(`${baseUrl()}/`);
        await page.waitForURL(`${baseUrl()}${role.home}**`);
        const titles = new Map<string, string>();
        const findings: string[] = [];
        for (const visit of await role.pages(page)) {
          await page.goto(`${baseUrl()}${visit.path}`);
          const heading = page.getByRole('heading', { level: 1, name: visit.heading });
          await heading.waitFor();
          await page.waitForLoadState('networkidle');
          // Nothing wider than the screen: a phone never scrolls sideways.
          expect(await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth), `${visit.path} scrolls sideways`).toBeLessThanOrEqual(0);
          const title = await page.title();
          expect(title, visit.path).toMatch(/ · Dwell$/);
          expect(title, visit.path).toContain((await heading.textContent())!.trim());
          expect([...titles.values()], `${visit.path} has a title of its own`).not.toContain(title);
          titles.set(visit.path, title);
          if (visit.shot) await screenshot(page, `${visit.shot}-${width}`, true, false);
          findings.push(...(await seriousFindings(page, visit.path)));
        }
        expect(findings).toEqual([]);
        expect(warnings).toEqual([]);
        await context.close();
        // Up to nine pages, each read by axe: twice a journey's time on a busy machine.
      }, 360_000);
});

describe('moving around by keyboard and screen reader', () => {
  it('a link to another page puts focus on its heading; a busy button keeps focus and says it is busy', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await page.goto(`${baseUrl()}/sign-in`);
    await page.getByLabel('E-mail').fill('desk@demo.test');
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    // Hold the sign-in answer back a moment, so the button is seen while busy.
    let signIns = 0;
    page.on('request', (r) => {
      if (r.method() === 'POST' && r.url().endsWith('/api/session')) signIns++;
    });
    let release: () => void = () => undefined;
    const held = new Promise<void>((resolve) => (release = resolve));
    await page.route('**/api/session', async (route) => {
      if (route.request().method() === 'POST') await held;
      await route.continue();
    });
    // The form's one submit button, whatever it says while busy.
    const button = page.locator('main form button[type="submit"]');
    await button.focus();
    await page.keyboard.press('Enter');
    await expect.poll(() => button.getAttribute('aria-disabled')).toBe('true');
    expect(await button.evaluate((b) => b === document.activeElement && !(b as HTMLButtonElement).disabled)).toBe(true);
    // Pressed again while busy, it sends nothing more.
    await page.keyboard.press('Enter');
    release();
    await page.waitForURL(`${baseUrl()}/desk**`);
    expect(signIns).toBe(1);
    await page.unrouteAll();

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Standby' }).click();
    const heading = page.getByRole('heading', { level: 1, name: 'Standby list' });
    await heading.waitFor();
    await expect.poll(() => heading.evaluate((h) => h === document.activeElement)).toBe(true);
    expect(await page.title()).toBe('Standby list · Dwell');
    await context.close();
  });

  it('says so when the connection is lost, and stops saying it once it is back', async () => {
    const context = await browser.newContext({ viewport: { width: 375, height: 800 } });
    const page = await context.newPage();
    await signInThroughPage(page, 'client@demo.test', DEMO_PASSWORD);
    await page.waitForURL(`${baseUrl()}/me**`);
    await context.setOffline(true);
    const banner = page.getByRole('status').filter({ hasText: 'No connection.' });
    await banner.waitFor();
    await context.setOffline(false);
    await banner.waitFor({ state: 'detached' });
    await context.close();
  });
});
