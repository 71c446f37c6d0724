import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb, createPool } from '@server/db/database';
import { DEMO_PASSWORD } from '@server/demo/demo-catalogue';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { insertSittingAround } from '../factories/day-of-service';
import { insertDemoStylist, removeDemoVisit } from '../factories/demo-visit';
import { baseUrl, connectBrowser, screenshot, signedInPage, signInThroughPage } from '../setup/browser';

// The desk marks a client arrived, and the stylist taps the sitting through on My day on a 768 px tablet, with Undo.
// The sitting is placed at the real "now" (the demo's own may fall on a closed day) with a stylist, chair and basin of
// its own, and removed afterwards so the other browser tests see the demo salon as loaded.

const lightener: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'hands_on', label: 'Apply lightener', product: 'lightener', minutes: 20 },
        { kind: 'developing', label: 'Lightener lifts', product: 'lightener', minMinutes: 20, maxMinutes: 30 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 15 },
      ],
    },
  ],
};

const pool = createPool(inject('databaseUrl'));
const db = createDb(pool);
let browser: Browser;
let bookingId: string;
let clientName: string;
const stylistEmail = `rowan.${Date.now()}@demo.test`;
const made: { userId?: string; staffId?: string } = {};

beforeAll(async () => {
  browser = await connectBrowser();
  const salon = await db.selectFrom('salons').select('id').where('slug', '=', 'kestrel-and-pine').executeTakeFirstOrThrow();
  Object.assign(made, await insertDemoStylist(db, salon.id, { name: 'Rowan Hale', displayName: 'Rowan', email: stylistEmail }));
  const client = await db.selectFrom('clients').select(['id', 'name']).where('salon_id', '=', salon.id).orderBy('name').executeTakeFirstOrThrow();
  clientName = client.name;
  const service = await db.selectFrom('services').select('id').where('salon_id', '=', salon.id).where('category', '=', 'colour').executeTakeFirstOrThrow();
  bookingId = await insertSittingAround(db, {
    salonId: salon.id,
    serviceId: service.id,
    stylistId: made.staffId!,
    clientId: client.id,
    minutesAgo: 0,
    plan: lightener,
  });
});

afterAll(async () => {
  await browser.close();
  await removeDemoVisit(db, bookingId, made);
  await db.destroy();
});

/** The signed-in stylist's My day at a given size. */
async function myDayAt(width: number, height: number): Promise<Page> {
  const context = await browser.newContext({ viewport: { width, height } });
  const page = await context.newPage();
  await signInThroughPage(page, stylistEmail, DEMO_PASSWORD);
  await page.waitForURL(`${baseUrl()}/stylist**`);
  await page.getByRole('heading', { level: 1, name: 'My day' }).waitFor();
  return page;
}

/** The answer to a tap on the sitting (the page's first write may be answered CSRF and sent again, as the api client does). */
const tapAnswer = (page: Page, action: string) =>
  page.waitForResponse(
    async (r) => r.url().includes(`/api/bookings/${bookingId}/sittings/1/${action}`) && !(r.status() === 403 && (await r.text()).includes('"CSRF"')),
  );

/** One tap on a large target (at least 48 px high), answered by the day-of-service API. */
async function tap(page: Page, name: RegExp | string) {
  const button = page.getByRole('button', { name });
  await button.waitFor();
  const box = await button.boundingBox();
  // WCAG 2.2's target size (minimum) asks 24 px; one-tap buttons at the station are made 48 px or more.
  expect(box!.height).toBeGreaterThanOrEqual(48);
  const [response] = await Promise.all([tapAnswer(page, ''), button.click()]);
  expect(response.status(), await response.text()).toBe(200);
}

describe('running a sitting', () => {
  it('the desk marks the arrival; the stylist taps the sitting through on My day at 768 px; Undo puts a tap back', async () => {
    const desk = await signedInPage(browser, 'desk@demo.test', '/desk');
    await desk.getByRole('heading', { name: 'Arrivals' }).waitFor();
    const row = desk.getByRole('listitem').filter({ hasText: 'Rowan' }).filter({ hasText: clientName });
    const [arrived] = await Promise.all([tapAnswer(desk, 'arrive'), row.getByRole('button', { name: /^Arrived/ }).click()]);
    expect(arrived.status(), await arrived.text()).toBe(200);
    await row.getByText(/^Arrived/).waitFor();
    await row.getByRole('button', { name: /^Undo/ }).waitFor();
    await desk.context().close();

    const page = await myDayAt(768, 1024);
    const card = page.getByRole('article', { name: new RegExp(clientName) });
    await card
      .getByText(/^Arrived/)
      .first()
      .waitFor();
    await tap(page, 'Start step 1: Apply lightener');
    await tap(page, /^Undo/);
    await tap(page, 'Start step 1: Apply lightener');
    await tap(page, 'Finish step 1: Apply lightener');
    await tap(page, 'Start step 2: Lightener lifts');
    // The developing timer counts from the end of the application, as tapped.
    await card.getByText(/from the real start/).waitFor();
    await card.getByText(/on the hair \d+ of 50 min limit/).waitFor();
    await screenshot(page, 'my-day-768', true);
    const phone = await myDayAt(375, 800);
    await phone.getByRole('button', { name: 'Finish step 2: Lightener lifts' }).waitFor();
    await screenshot(phone, 'my-day-375');
    expect(await phone.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
    await phone.context().close();

    await tap(page, 'Finish step 2: Lightener lifts');
    await tap(page, 'Start step 3: Rinse');
    await tap(page, 'Finish step 3: Rinse');
    await card.getByText('All steps done.').waitFor();
    await card.getByText('Finished').first().waitFor();
    await page.context().close();
  });
});
