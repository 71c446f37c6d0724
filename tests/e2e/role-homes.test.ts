import { AxeBuilder } from '@axe-core/playwright';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '@server/demo/demo-catalogue';
import { baseUrl, connectBrowser, screenshot, signInThroughPage, WCAG_TAGS } from '../setup/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(() => browser.close());

const roles = [
  { email: 'owner@demo.test', path: '/owner', heading: 'Salon overview', shows: 'Kestrel & Pine Hair Studio' },
  { email: 'desk@demo.test', path: '/desk', heading: "Today's book", shows: 'Ana Moreno' },
  { email: 'ana@demo.test', path: '/stylist', heading: 'My day', shows: 'Ana Moreno' },
  { email: 'client@demo.test', path: '/me', heading: 'My bookings', shows: 'Colour correction (two sittings)' },
];

describe('each demo role signs in through the page and lands on its own home', () => {
  for (const role of roles) {
    it(`${role.email} → ${role.path}`, async () => {
      const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
      const page = await context.newPage();
      await signInThroughPage(page, role.email, DEMO_PASSWORD);
      await page.waitForURL(`${baseUrl()}${role.path}**`);
      await page.getByRole('heading', { level: 1, name: role.heading }).waitFor();
      await page.getByText(role.shows).first().waitFor();
      if (role.path === '/owner')
        await page
          .getByText(/^\d+(\.\d)?\s?%$/)
          .first()
          .waitFor(); // occupancy from the engine
      await screenshot(page, `${role.path.slice(1)}-home`, role.path === '/owner' || role.path === '/me');
      // WCAG 2.x A/AA rules through axe-core (Deque), the reference checker for automated accessibility tests.
      const axe = await new AxeBuilder({ page }).withTags(WCAG_TAGS).analyze();
      expect(axe.violations.map((v) => `${v.id}: ${v.nodes.length}`)).toEqual([]);
      await context.close();
    });
  }

  it('signed out, a role page sends you to sign-in; a wrong password shows the message', async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await page.goto(`${baseUrl()}/owner`);
    await page.waitForURL(/\/sign-in\?next=/);
    await signInThroughPage(page, 'owner@demo.test', 'not-the-password');
    await page.getByText('That e-mail and password do not match an account.').waitFor();
    await context.close();
  });

  it('the client sees both sittings of their two-sitting correction', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await signInThroughPage(page, 'client@demo.test', DEMO_PASSWORD);
    await page.waitForURL(`${baseUrl()}/me**`);
    await page
      .getByText(/Sitting 2 of 2/i)
      .first()
      .waitFor();
    await context.close();
  });
});
