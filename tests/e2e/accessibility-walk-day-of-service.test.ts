import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb, createPool } from '@server/db/database';
import { runningLateScene, type RunningLateScene } from '../factories/running-late-scene';
import { TEST_PASSWORD } from '../factories/user';
import { baseUrl, connectBrowser, screenshot, seriousFindings, signInThroughPage } from '../setup/browser';

// The day-of-service pages, which the walk of every page (accessibility-walk.test.ts) sees only idle: My day with a
// sitting under way, and the desk's day with the Running late panel showing a conflict and its fixes, at a desktop
// and a phone width. axe-core's automated WCAG 2.0, 2.1 and 2.2 A and AA checks (Deque's rules) find nothing serious
// or critical, and the console stays quiet. A salon of its own keeps the demo salon as loaded for the other tests.

const WIDTHS = [1280, 375];
const pool = createPool(inject('databaseUrl'));
const db = createDb(pool);
let browser: Browser;
let day: RunningLateScene;

beforeAll(async () => {
  browser = await connectBrowser();
  // Robin's gloss was booked from 20 minutes ago; nothing has been started, so starting it now runs into Sasha's cut.
  day = await runningLateScene(db, { runningName: 'Robin Vale', laterName: 'Sasha Lind', laterPhone: '+19705550188', glossFrom: -20 });
});

afterAll(async () => {
  await browser.close();
  await db.destroy();
});

/** A signed-in page at this width, arrived at its home, with every console warning kept. */
async function signedInAt(email: string, home: string, width: number): Promise<{ page: Page; warnings: string[] }> {
  const context = await browser.newContext({ viewport: { width, height: 900 } });
  const page = await context.newPage();
  const warnings: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'warning') warnings.push(m.text());
  });
  await signInThroughPage(page, email, TEST_PASSWORD);
  await page.waitForURL(`${baseUrl()}${home}**`);
  return { page, warnings };
}

describe('the day of service, read by axe at both widths', () => {
  it('My day with a sitting under way and the desk’s day with a running-late conflict: no serious or critical findings', async () => {
    // Robin's first step is started late, on My day: the sitting is under way and now runs into Sasha's cut.
    const { page: starter } = await signedInAt(day.stylistEmail, '/stylist', 1280);
    const card = starter.getByRole('article', { name: /Robin Vale/ });
    await card.getByRole('button', { name: 'Start step 1: Apply gloss' }).click();
    await card.getByRole('button', { name: 'Finish step 1: Apply gloss' }).waitFor();
    await starter.context().close();

    const findings: string[] = [];
    const warnings: string[] = [];
    for (const width of WIDTHS) {
      const stylist = await signedInAt(day.stylistEmail, '/stylist', width);
      await stylist.page.getByRole('heading', { level: 1, name: 'My day' }).waitFor();
      const running = stylist.page.getByRole('article', { name: /Robin Vale/ });
      await running.getByRole('button', { name: 'Finish step 1: Apply gloss' }).waitFor();
      await stylist.page.waitForLoadState('networkidle');
      if (width === 375) await screenshot(stylist.page, 'my-day-under-way-375', true, false);
      findings.push(...(await seriousFindings(stylist.page, `My day under way at ${width} px`)));
      warnings.push(...stylist.warnings);
      await stylist.page.context().close();

      const desk = await signedInAt(day.deskEmail, '/desk', width);
      const panel = desk.page.getByRole('region', { name: 'Running late' });
      const conflict = panel.getByRole('article', { name: 'Running late: Sasha Lind' });
      await conflict.getByRole('button', { name: /^Hand Sasha Lind over to / }).waitFor();
      await desk.page.waitForLoadState('networkidle');
      if (width === 375) await screenshot(desk.page, 'running-late-desk-375', true, false);
      findings.push(...(await seriousFindings(desk.page, `the desk's day with Running late at ${width} px`)));
      warnings.push(...desk.warnings);
      await desk.page.context().close();
    }
    expect(findings).toEqual([]);
    expect(warnings).toEqual([]);
  });
});
