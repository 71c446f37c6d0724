import { DateTime } from 'luxon';
import { AxeBuilder } from '@axe-core/playwright';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '@server/demo/demo-catalogue';
import { baseUrl, connectBrowser, screenshot, signInThroughPage, WCAG_TAGS } from '../setup/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(() => browser.close());

it('the owner opens Utilisation on the demo salon: charts, their tables, a CSV download, another period', async () => {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 }, acceptDownloads: true });
  const page = await context.newPage();
  await signInThroughPage(page, 'owner@demo.test', DEMO_PASSWORD);
  await page.waitForURL(`${baseUrl()}/owner**`);
  const answer = page.waitForResponse((r) => r.url().includes('/api/owner/utilisation?') && r.status() === 200);
  await page.getByRole('link', { name: 'Utilisation' }).click();
  const api = await (await answer).json();
  await page.getByRole('heading', { level: 1, name: 'Utilisation' }).waitFor();
  // The page shows the API's (engine's) chair occupancy, rounded to a whole percent.
  const shown = `${Math.round(api.chairOccupancy * 100)}%`;
  await page.getByText('Chair occupancy', { exact: true }).first().waitFor();
  expect(await page.locator('dl').first().innerText()).toContain(shown);
  // The heat map chart is drawn, and its table holds one row per open weekday-hour.
  await page
    .getByRole('img', { name: /Heat map of chair occupancy/ })
    .getByText(/^\d+%$/)
    .first()
    .waitFor();
  const heatTable = page.getByRole('region', { name: 'Chair occupancy by weekday and hour' });
  expect(await heatTable.locator('tbody tr').count()).toBe(api.heatMap.length);
  // Its hours read as the salon's clock does, one label per column, each inside its own column's width.
  const ticks = page
    .getByRole('img', { name: /Heat map of chair occupancy/ })
    .locator('.recharts-cartesian-axis-tick-value')
    .filter({ hasText: /^\d{1,2} (AM|PM)$/ });
  await ticks.first().waitFor();
  expect(await ticks.count()).toBe(new Set(api.heatMap.map((c: { hour: number }) => c.hour)).size);
  const boxes = await ticks.evaluateAll((els) => els.map((e) => e.getBoundingClientRect()).map((r) => ({ left: r.left, right: r.right })));
  for (let i = 1; i < boxes.length; i++) expect(boxes[i]!.left, 'hour labels overlap').toBeGreaterThan(boxes[i - 1]!.right);
  // The page has a print layout, and a button for it.
  await page.getByRole('button', { name: 'Print' }).waitFor();
  // The stylist bars and their table: the demo salon's three stylists.
  const stylists = page.getByRole('region', { name: 'Figures per stylist' });
  for (const name of ['Ana Moreno', 'Marcus Bell', 'Lee Tanaka']) await stylists.getByText(name).waitFor();
  await screenshot(page, 'owner-utilisation', true);
  // WCAG 2.x A/AA rules through axe-core (Deque).
  const axe = await new AxeBuilder({ page }).withTags(WCAG_TAGS).analyze();
  expect(axe.violations.map((v) => `${v.id}: ${v.nodes.length}`)).toEqual([]);

  const download = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Download CSV: Figures per stylist' }).click();
  const file = await download;
  // Named for the period's own first and last days (the API's `to` is the day after the last).
  const lastDay = DateTime.fromISO(api.period.to).minus({ days: 1 }).toISODate();
  expect(file.suggestedFilename()).toBe(`stylists-${api.period.from}-to-${lastDay}.csv`);
  const chunks: Buffer[] = [];
  for await (const chunk of await file.createReadStream()) chunks.push(chunk as Buffer);
  const csv = Buffer.concat(chunks).toString('utf8');
  const lines = csv.split('\r\n');
  // Shares as percentages and amounts in the currency's units, each header naming its unit.
  expect(lines[0]).toBe('Stylist,Hands-on share (%),Hands-on minutes,Minutes on the clock,Bookings,No-shows,Revenue (USD),Revenue per hour on the clock (USD)');
  const ana = api.stylists.find((s: { name: string }) => s.name === 'Ana Moreno');
  const anaRow = lines.find((l) => l.startsWith('Ana Moreno,'))!.split(',');
  expect(Number(anaRow[1])).toBe(Math.round(ana.handsOnShare * 1000) / 10);
  expect(lines).toHaveLength(1 + api.stylists.length);
  expect(csv).toContain('Ana Moreno');

  // Another period through the picker: a month.
  const monthly = page.waitForResponse((r) => r.url().includes('period=month') && r.status() === 200);
  await page.getByLabel('Period', { exact: true }).selectOption('month');
  await page.getByRole('button', { name: 'Show figures' }).click();
  const month = await (await monthly).json();
  expect(month.period.kind).toBe('month');
  await page.waitForURL(/period=month/);
  await expect.poll(() => page.getByRole('region', { name: 'Weekly figures' }).locator('tbody tr').count(), { timeout: 15_000 }).toBe(month.weeks.length);
  await context.close();
});

it('the desk sees occupancy and window use without money or stylists; a bad custom period is refused on the page', async () => {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  await signInThroughPage(page, 'desk@demo.test', DEMO_PASSWORD);
  await page.waitForURL(`${baseUrl()}/desk**`);
  await page.getByRole('link', { name: 'Chair use' }).click();
  await page.getByRole('heading', { level: 1, name: 'Chair use' }).waitFor();
  await page.getByRole('img', { name: /Heat map of chair occupancy/ }).waitFor();
  expect(await page.getByText('Revenue per chair-hour').count()).toBe(0);
  expect(await page.getByRole('region', { name: 'Figures per stylist' }).count()).toBe(0);
  await page.getByLabel('Period', { exact: true }).selectOption('custom');
  await page.getByLabel('First day').fill('2027-01-01');
  await page.getByLabel('Last day').fill('2029-06-01');
  await page.getByRole('button', { name: 'Show figures' }).click();
  await page.getByText(/at most 2 years long/).waitFor();
  await context.close();
});
