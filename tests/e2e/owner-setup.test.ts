import { DateTime } from 'luxon';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '@server/demo/demo-catalogue';
import { setupPaths } from '../setup/setup-paths';
import { apiWrite, baseUrl, connectBrowser, screenshot, signInThroughPage } from '../setup/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(() => browser.close());

type Option = { sittings: { start: string; steps: unknown[] }[] };

/** Asks for Blow-dry times from the desk's booking page and answers what the page was given. */
async function deskOptions(page: Page, earliest: string): Promise<Option[]> {
  await page.goto(`${baseUrl()}/desk/book`);
  await page.getByRole('heading', { level: 1, name: 'Book a service' }).waitFor();
  await page.getByLabel('Client').fill('Priya');
  await page
    .getByRole('list', { name: 'Matching clients' })
    .getByRole('button', { name: /Priya Raman/ })
    .click();
  await page.getByLabel('Service').selectOption({ label: 'Blow-dry' });
  await page.getByLabel('Earliest date').fill(earliest);
  const [response] = await Promise.all([
    page.waitForResponse((r) => r.url().includes('/api/booking-options')),
    page.getByRole('button', { name: 'Find times' }).click(),
  ]);
  expect(response.status()).toBe(200);
  return (await response.json()).options;
}

/** A write through the API with this page's session (to put the shared demo salon back as it was). */
async function apiPut(page: Page, path: string, body: unknown) {
  expect(await apiWrite(page, 'PUT', path, body)).toBe(200);
}

describe('owner set-up', () => {
  it('changes the opening hours and a step plan, and the desk’s booking options change with them', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    page.on('pageerror', (e) => console.log('page error:', e.message));
    await signInThroughPage(page, 'owner@demo.test', DEMO_PASSWORD);
    await page.waitForURL(`${baseUrl()}/owner**`);
    const originalSettings = await (await page.request.get(`${baseUrl()}${setupPaths.salon}`)).json();
    const services = (await (await page.request.get(`${baseUrl()}${setupPaths.services}`)).json()).services as {
      id: string;
      name: string;
      [k: string]: unknown;
    }[];
    const blowDry = services.find((s) => s.name === 'Blow-dry')!;

    const { id: _id, active: _active, futureBookings: _future, depositPercent, ...rest } = blowDry;
    try {
      const tuesday = DateTime.now().setZone('America/Denver').plus({ weeks: 2 }).set({ weekday: 2 }).toISODate()!;
      const before = await deskOptions(page, tuesday);
      expect(before[0]!.sittings[0]!.start.slice(0, 10)).toBe(tuesday);
      expect(before[0]!.sittings[0]!.steps).toHaveLength(1);

      // Opening hours: no longer open on Tuesdays.
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Set-up' }).click();
      await page.getByRole('heading', { name: 'Opening hours' }).waitFor();
      await screenshot(page, 'owner-setup-salon', true);
      const tue = page.getByRole('group', { name: 'Days of hours line 1' }).getByRole('button', { name: 'Tue' });
      expect(await tue.getAttribute('aria-pressed')).toBe('true');
      await tue.click();
      await expect.poll(() => page.getByLabel('Rule of hours line 1').inputValue()).toBe('FREQ=WEEKLY;BYDAY=WE,TH,FR,SA');
      await page
        .getByText(/^Next dates:/)
        .filter({ hasNotText: /Tue / })
        .waitFor();
      // A closed date (a holiday) on a Wednesday: it once took the public page down with a 500.
      const closedWednesday = DateTime.fromISO(tuesday).plus({ days: 1 });
      await page.getByLabel('Closed on (holiday or exception)').fill(closedWednesday.toISODate()!);
      await page.getByRole('button', { name: 'Add closed date' }).click();
      await page.getByText(/^Reads as: Wednesday to Saturday; closed on /).waitFor();
      await page.getByRole('button', { name: 'Save salon settings' }).click();
      await page.getByText('The salon settings are saved').waitFor();
      await page.goto(`${baseUrl()}/salon/kestrel-and-pine`);
      await page.getByRole('heading', { level: 1, name: 'Kestrel & Pine Hair Studio' }).waitFor();
      // Dates in words follow the format policy (docs/architecture.md, Formats): weekday, day, month, year.
      await page.getByText(`closed on ${closedWednesday.setLocale('en-US').toFormat('ccc d LLL yyyy')}`, { exact: false }).waitFor();
      await page.goto(`${baseUrl()}/owner/setup`);
      await page.getByRole('heading', { name: 'Opening hours' }).waitFor();

      // Step plan: Blow-dry gains a second step.
      await page.getByRole('navigation', { name: 'Set-up' }).getByRole('link', { name: 'Services and step plans' }).click();
      await page.getByRole('region', { name: 'Services', exact: true }).waitFor();
      await screenshot(page, 'owner-setup-services', true);
      await page.getByRole('link', { name: 'Blow-dry', exact: true }).click();
      await page.getByRole('heading', { level: 1, name: 'Blow-dry' }).waitFor();
      await page.getByRole('button', { name: 'Add a step' }).click();
      await page.getByLabel('Name of step 2').fill('Finishing spray');
      await page.getByLabel('Minutes of step 2').fill('15');
      // A new step names what it puts on the hair; nothing is chosen for it, so a colour step is never left at "nothing".
      await page.getByLabel('What step 2 puts on the hair').selectOption('none');
      const [saved] = await Promise.all([
        page.waitForResponse((r) => r.url().includes(setupPaths.service(blowDry.id))),
        page.getByRole('button', { name: 'Save the service' }).click(),
      ]);
      expect(saved.status()).toBe(200);
      await page.getByRole('region', { name: 'Services', exact: true }).waitFor();

      const after = await deskOptions(page, tuesday);
      expect(after.length).toBeGreaterThan(0);
      for (const option of after) expect(DateTime.fromISO(option.sittings[0]!.start, { zone: 'America/Denver' }).weekday).not.toBe(2);
      expect(after[0]!.sittings[0]!.steps).toHaveLength(2);

      await page.goto(`${baseUrl()}/owner/setup/staff`);
      await page.getByRole('region', { name: 'Staff', exact: true }).waitFor();
      await page.getByRole('button', { name: 'Change Ana Moreno' }).click();
      await page.getByRole('heading', { name: 'Deactivate Ana Moreno' }).waitFor();
      await page.getByRole('list', { name: 'Future bookings of Ana Moreno' }).waitFor();
      await screenshot(page, 'owner-setup-staff', true);
    } finally {
      // Put the shared demo salon back for the other journeys.
      await apiPut(page, setupPaths.salon, originalSettings);
      await apiPut(page, setupPaths.service(blowDry.id), { ...rest, depositKind: depositPercent === null ? 'fixed' : 'percent', depositPercent });
      await context.close();
    }
  });

  it('a non-owner is turned away from the set-up pages and routes', async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signInThroughPage(page, 'desk@demo.test', DEMO_PASSWORD);
    await page.waitForURL(`${baseUrl()}/desk**`);
    expect((await page.request.get(`${baseUrl()}${setupPaths.salon}`)).status()).toBe(403);
    await page.goto(`${baseUrl()}/owner/setup`);
    await page.getByRole('heading', { level: 1, name: 'Not for your role' }).waitFor();
    expect(await page.getByRole('form', { name: 'Salon settings' }).count()).toBe(0);
    await context.close();
  });
});
