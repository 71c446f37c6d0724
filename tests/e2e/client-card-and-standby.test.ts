import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiWrite, baseUrl, connectBrowser, screenshot, signedInPage } from '../setup/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(() => browser.close());

const getJson = async (page: Page, path: string) => (await page.request.get(`${baseUrl()}${path}`)).json();

describe('the client card', () => {
  it('takes the team’s notes, opens each booking, and starts a booking for the client', async () => {
    const page = await signedInPage(browser, 'desk@demo.test', '/desk');
    const { clients } = (await getJson(page, '/api/clients?q=Priya')) as { clients: { id: string; name: string }[] };
    const priya = clients[0]!;
    await page.goto(`${baseUrl()}/desk/clients/${priya.id}`);
    await page.getByRole('heading', { level: 1, name: priya.name }).waitFor();

    const notes = `Prefers the window chair (${Date.now()}).`;
    await page.getByLabel('Notes for the team').fill(notes);
    await page.getByRole('button', { name: 'Save notes' }).click();
    await page.getByText('Notes saved.').waitFor();
    await page.reload();
    await expect.poll(() => page.getByLabel('Notes for the team').inputValue()).toBe(notes);

    const open = page.getByRole('link', { name: /^Open .+ for / }).first();
    if (await open.count()) {
      await open.click();
      await page.waitForURL(/\/desk\/bookings\//);
      await page.getByRole('heading', { level: 1, name: new RegExp(priya.name) }).waitFor();
      await page.goBack();
    }
    await page.getByRole('link', { name: `Book for ${priya.name}` }).click();
    await page.getByRole('heading', { level: 1, name: 'Book a service' }).waitFor();
    await page.getByText(priya.name).first().waitFor();
    await page.context().close();
  });
});

describe('the standby list', () => {
  it('books a standby client with what they asked for filled in, and asks before removing an entry', async () => {
    const page = await signedInPage(browser, 'desk@demo.test', '/desk');
    // An entry of this test's own, so the demo's list stays as the other journeys expect it.
    const { clients } = (await getJson(page, '/api/clients?q=Hollis')) as { clients: { id: string; name: string }[] };
    const { services } = (await getJson(page, '/api/services')) as { services: { id: string; name: string; category: string }[] };
    const toner = services.find((s) => s.name === 'Toner refresh')!;
    const hollis = clients[0]!;
    const added = await apiWrite(page, 'POST', '/api/standby', {
      clientId: hollis.id,
      serviceIds: [toner.id],
      stylistId: null,
      availability: [{ weekdays: [2, 3], from: '14:00', to: '18:00' }],
      notes: '',
    });
    expect(added).toBe(201);
    await page.goto(`${baseUrl()}/desk/standby`);
    await page.getByRole('heading', { level: 1, name: 'Standby list' }).waitFor();
    // Availability on the salon's clock, as everywhere else.
    const row = page.getByRole('row').filter({ hasText: hollis.name }).filter({ hasText: 'Toner refresh' });
    await row.getByText('Tue, Wed 2:00 PM – 6:00 PM').waitFor();

    await row.getByRole('link', { name: `Book ${hollis.name}` }).click();
    await page.getByRole('heading', { level: 1, name: 'Book a service' }).waitFor();
    await page.getByText(hollis.name).first().waitFor();
    expect(await page.getByLabel('Service').inputValue()).toBe(toner.id);
    await page.goBack();

    const remove = row.getByRole('button', { name: `Remove ${hollis.name} from the standby list` });
    await remove.click();
    const question = row.getByRole('group', { name: `Remove ${hollis.name} from the standby list?` });
    await expect.poll(() => question.getByRole('button', { name: 'Keep' }).evaluate((b) => b === document.activeElement)).toBe(true);
    await screenshot(page, 'desk-standby-remove', false, false);
    await question.getByRole('button', { name: 'Keep' }).click();
    await expect.poll(() => remove.evaluate((b) => b === document.activeElement)).toBe(true);
    await remove.click();
    await question.getByRole('button', { name: 'Yes, remove' }).click();
    await page.getByText(`Removed ${hollis.name} from the standby list.`).waitFor();
    await row.waitFor({ state: 'detached' });
    await page.context().close();
  });
});

describe('set-up in plain words', () => {
  it('a new hours line starts on a day no line has, and follow-up timing is written in words', async () => {
    const page = await signedInPage(browser, 'owner@demo.test', '/owner');
    await page.goto(`${baseUrl()}/owner/setup`);
    await page.getByRole('heading', { level: 1, name: 'Set-up' }).waitFor();
    await page.getByRole('button', { name: 'Add an hours line' }).first().click();
    // The demo salon opens Tuesday to Saturday: the new line starts on Monday, and nothing is doubled.
    const days = page.getByRole('group', { name: 'Days of hours line 2' });
    expect(await days.getByRole('button', { pressed: true }).allTextContents()).toEqual(['Mon']);
    expect(await page.getByText('Also in another line:').count()).toBe(0);
    // The calendar text is there for experts, folded away.
    expect(await page.getByLabel('Rule of hours line 1').isVisible()).toBe(false);

    await page.goto(`${baseUrl()}/owner/setup/follow-up-rules`);
    await page.getByRole('heading', { level: 1, name: 'Set-up' }).waitFor();
    await page.getByRole('group', { name: 'When it is sent' }).waitFor();
    expect(await page.getByLabel('After', { exact: true }).inputValue()).toBe('6');
    expect(await page.getByLabel('Unit', { exact: true }).inputValue()).toBe('WEEKLY');
    await page.getByLabel('After', { exact: true }).fill('8');
    await page.getByText(/^Preview: for a sitting ending/).waitFor();
    expect(await page.getByLabel('Calendar rule').inputValue()).toBe('FREQ=WEEKLY;INTERVAL=8;COUNT=1');
    await page.context().close();
  });
});
