import { DateTime } from 'luxon';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, connectBrowser, screenshot, signedInPage } from '../setup/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(() => browser.close());

const apiAnswer = (page: Page, method: string, path: RegExp) =>
  page.waitForResponse((r) => r.request().method() === method && path.test(new URL(r.url()).pathname));
/** What a datetime-local field takes, in the demo salon's zone. */
const typed = (d: DateTime) => d.setZone('America/Denver').toFormat("yyyy-LL-dd'T'HH:mm");

describe('client card: skin tests', () => {
  it('the desk records a test as applied, then its reading; a reading before the test was applied is refused beside the field', async () => {
    const page = await signedInPage(browser, 'desk@demo.test', '/desk');
    // A demo client with no skin test on record, so no other check relies on her tests.
    const found = await (await page.request.get(`${baseUrl()}/api/clients?q=Vesna`)).json();
    const vesna = found.clients[0] as { id: string };
    await page.goto(`${baseUrl()}/desk/clients/${vesna.id}`);
    await page.getByRole('heading', { level: 1, name: 'Vesna Horvat' }).waitFor();

    // Applied two days ago, on the minute, and not read yet (48 hours is the usual lead: common practice).
    const applied = DateTime.now().minus({ hours: 48 }).startOf('minute');
    const recordForm = page.getByRole('form', { name: 'Record a skin test' });
    await recordForm.getByLabel('Applied at').fill(typed(applied));
    await recordForm.getByLabel('Product type tested').fill('Permanent 6.0 with 6 % developer');
    const recorded = apiAnswer(page, 'POST', /\/skin-tests$/);
    await recordForm.getByRole('button', { name: 'Record skin test' }).click();
    expect((await recorded).status()).toBe(201);

    const tests = page.getByRole('list', { name: 'Skin tests' });
    await tests.getByText('Applied, not read yet').waitFor();
    const reading = tests.getByRole('form', { name: 'Record the reading' });
    await reading.getByLabel('Read at').fill(typed(applied.minus({ hours: 1 })));
    const refused = apiAnswer(page, 'POST', /\/reading$/);
    await reading.getByRole('button', { name: 'Record the reading' }).click();
    expect((await refused).status()).toBe(400);
    await reading.getByText(/A test cannot be read before it was applied/).waitFor();
    await screenshot(page, 'desk-client-skin-test-pending');

    await reading.getByLabel('Read at').fill(typed(DateTime.now().startOf('minute')));
    await reading.getByLabel('Result').selectOption({ label: 'Negative (no reaction)' });
    const read = apiAnswer(page, 'POST', /\/reading$/);
    await reading.getByRole('button', { name: 'Record the reading' }).click();
    expect((await read).status()).toBe(200);
    await tests.getByText('Negative (no reaction)').waitFor();
    await tests.getByText(/read .* by Sam Okafor/).waitFor(); // the demo front desk, signed in above
    expect(await tests.getByRole('form', { name: 'Record the reading' }).count()).toBe(0);
    await screenshot(page, 'desk-client-skin-test-read');
    await page.context().close();
  });
});
