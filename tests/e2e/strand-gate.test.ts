import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, expect, it } from 'vitest';
import { baseUrl, connectBrowser, screenshot, signedInPage } from '../setup/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(() => browser.close());

it('after a failed strand test the quote plans no lightener, and adding it asks for a written reason that is kept', async () => {
  const page = await signedInPage(browser, 'ana@demo.test', '/stylist');
  const cyrus = ((await (await page.request.get(`${baseUrl()}/api/clients?q=Cyrus`)).json()).clients as { id: string }[])[0]!;
  const { token } = await (await page.request.get(`${baseUrl()}/api/csrf`)).json();
  const recorded = await page.request.post(`${baseUrl()}/api/clients/${cyrus.id}/strand-tests`, {
    headers: { 'X-CSRF-Token': token },
    data: {
      testedAt: new Date(Date.now() - 86_400_000).toISOString(),
      tested: 'Lightener 1:2 with 6 % on a nape strand',
      productType: 'lightener',
      developerPercent: 6,
      minutes: 30,
      result: 'failed',
      notes: 'The strand stretched and broke',
      photoId: null,
    },
  });
  expect(recorded.status()).toBe(201);

  await page.goto(`${baseUrl()}/consultations/new?client=${cyrus.id}`);
  await page.getByRole('heading', { level: 1, name: /^Consultation for / }).waitFor();
  await page.getByLabel('Current level').fill('5');
  await page.getByLabel('Target level').fill('8');
  await page.getByLabel('Natural (never coloured)').uncheck();
  await page.getByLabel('Permanent colour').check();
  const proposed = page.waitForResponse((r) => r.url().endsWith('/api/consultations/propose'));
  await page.getByRole('button', { name: 'Propose a quote' }).click();
  const proposal = await (await proposed).json();
  // The record's failed test counts although the form still says "No strand test yet".
  expect(proposal.strandTest).toBe('failed');
  const products = proposal.stepPlan.sittings.flatMap((s: { steps: { product: string }[] }) => s.steps.map((st) => st.product));
  expect(products).not.toContain('lightener');
  await page.getByText(/The strand test failed: no lightener and no colour remover are planned/).waitFor();
  const reason = page.getByLabel('Reason to lighten or remove colour despite the failed strand test');
  await reason.waitFor();

  // The stylist adds a lightener step anyway: saving asks for the reason first.
  const sitting = page.getByRole('group', { name: 'Steps' });
  await sitting.getByRole('button', { name: 'Add a step' }).click();
  const count = proposal.stepPlan.sittings[0].steps.length + 1;
  await page.getByLabel(`Name of step ${count}`).fill('Lightener on the mid-lengths');
  await page.getByLabel(`What step ${count} puts on the hair`).selectOption('lightener');
  await page.getByLabel(`Minutes of step ${count}`).fill('20');
  await page.getByRole('button', { name: 'Save consultation and quote' }).click();
  await page
    .getByText(/at least 10 characters\)\.$/)
    .first()
    .waitFor();
  await screenshot(page, 'stylist-quote-strand-gate', true);
  await reason.fill('Client accepts the risk after two bond treatments; mid-lengths only, checked every 5 minutes.');
  const saved = page.waitForResponse((r) => r.request().method() === 'POST' && new URL(r.url()).pathname === '/api/consultations');
  await page.getByRole('button', { name: 'Save consultation and quote' }).click();
  const body = await (await saved).json();
  expect(body.quote.overrideReason).toBe('Client accepts the risk after two bond treatments; mid-lengths only, checked every 5 minutes.');
  await page.getByRole('heading', { level: 1, name: /^Quote for / }).waitFor();
  await expect
    .poll(() => page.getByLabel('Reason to lighten or remove colour despite the failed strand test').inputValue())
    .toMatch(/^Client accepts the risk/);
  await page.context().close();
});
