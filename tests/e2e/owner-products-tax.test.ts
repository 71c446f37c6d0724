import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb, createPool } from '@server/db/database';
import { DEMO_PASSWORD } from '@server/demo/demo-catalogue';
import { takeFromStock } from '@server/features/retail-products';
import { apiWrite, baseUrl, connectBrowser, expectAccessible, screenshot, screenshotDir, signedInPage, signInThroughPage } from '../setup/browser';
import { setupPaths } from '../setup/setup-paths';

// The app's own database: a sale at the desk is made here while the owner's form is open (checkout's screens come later).
const db = createDb(createPool(inject('databaseUrl')));
let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(async () => {
  await browser.close();
  await db.destroy();
});

type Product = { id: string; name: string; priceCents: number; stock: number; active: boolean };
const products = async (page: Page): Promise<Product[]> => (await (await page.request.get(`${baseUrl()}/api/retail-products`)).json()).products;

describe('owner set-up: products and tax', () => {
  it('the owner adds a product, recounts and retires it, and sets the tax rate, at 1280 px', async () => {
    const page = await signedInPage(browser, 'owner@demo.test', '/owner');
    page.on('pageerror', (e) => console.log('page error:', e.message));
    const original = await (await page.request.get(`${baseUrl()}${setupPaths.salon}`)).json();
    try {
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Set-up' }).click();
      await page.getByRole('navigation', { name: 'Set-up' }).getByRole('link', { name: 'Products' }).click();
      const list = page.getByRole('list', { name: 'Products' });
      await list.getByText('Bond-repair shampoo 250 ml', { exact: true }).waitFor();

      // Add: the price is typed in dollars and kept in cents.
      const add = page.getByRole('form', { name: 'New product' });
      await add.getByLabel('Name').fill('Gloss refresher 100 ml');
      await add.getByLabel('Price (USD)').fill('18.50');
      await add.getByLabel('In stock').fill('8');
      await add.getByRole('button', { name: 'Add product' }).click();
      await page.getByText('Gloss refresher 100 ml is added.').waitFor();
      await list.getByText('$18.50 · 8 in stock').waitFor();
      const added = (await products(page)).find((p) => p.name === 'Gloss refresher 100 ml');
      expect(added).toMatchObject({ priceCents: 1850, stock: 8, active: true });

      // Recount the stock; one sells at the desk while the form is open, so the count is refused once, then saved.
      await page.getByRole('button', { name: 'Change Gloss refresher 100 ml' }).click();
      const edit = page.getByRole('form', { name: 'Change Gloss refresher 100 ml' });
      expect(await edit.getByLabel('Name').evaluate((input) => input === document.activeElement)).toBe(true);
      // The product's own salon: other browser tests add salons of their own to this database.
      const salon = await db.selectFrom('retail_products').select('salon_id as id').where('id', '=', added!.id).executeTakeFirstOrThrow();
      expect(await takeFromStock(db, salon.id, added!.id, 1)).toBe(7);
      await edit.getByLabel('In stock').fill('11');
      await edit.getByRole('button', { name: 'Save product' }).click();
      await edit.getByText('The stock is 7 now, not 8: something was sold meanwhile. Count again and save.').waitFor();
      await edit.getByText('Stock read as 7; sales at checkout lower it.').waitFor();
      await edit.getByRole('button', { name: 'Save product' }).click();
      await page.getByText('Gloss refresher 100 ml is saved.').waitFor();
      expect((await products(page)).find((p) => p.id === added!.id)).toMatchObject({ stock: 11 });
      await expectAccessible(page);
      await screenshot(page, 'owner-setup-products', true);

      // A name another product has is refused beside the field.
      await add.getByLabel('Name').fill('Bond-repair shampoo 250 ml');
      await add.getByLabel('Price (USD)').fill('1');
      await add.getByRole('button', { name: 'Add product' }).click();
      await add.getByText('Another product already has this name.').waitFor();

      // Retire it: it stays listed, marked, and checkout no longer offers it.
      await page.getByRole('button', { name: 'Retire Gloss refresher 100 ml' }).click();
      await page.getByText('Gloss refresher 100 ml is retired').waitFor();
      expect((await products(page)).find((p) => p.name === 'Gloss refresher 100 ml')).toMatchObject({ stock: 11, active: false });
      await page.getByRole('button', { name: 'Put Gloss refresher 100 ml back on sale' }).waitFor();

      // Tax: 8.25 %, included in the prices.
      await page.getByRole('navigation', { name: 'Set-up' }).getByRole('link', { name: 'Salon and hours' }).click();
      const tax = page.getByRole('region', { name: 'Tax at checkout' });
      await tax.waitFor();
      expect(await tax.getByLabel('Tax rate (%)').inputValue()).toBe('0');
      await tax.getByLabel('Tax rate (%)').fill('55');
      await page.getByRole('button', { name: 'Save salon settings' }).click();
      await tax.getByText('At most 50 %').waitFor();
      await tax.getByLabel('Tax rate (%)').fill('8.25');
      await tax.getByLabel('Prices on the menu and the product list').selectOption({ label: 'Include tax: checkout shows the tax inside them' });
      await page.getByRole('button', { name: 'Save salon settings' }).click();
      await page.getByText('The salon settings are saved').waitFor();
      await tax.screenshot({ path: `${screenshotDir}/owner-setup-tax.png` });
      const saved = await (await page.request.get(`${baseUrl()}${setupPaths.salon}`)).json();
      expect(saved).toMatchObject({ taxRateMilliPercent: 8250, taxInclusive: true });
      await page.reload();
      expect(await page.getByRole('region', { name: 'Tax at checkout' }).getByLabel('Tax rate (%)').inputValue()).toBe('8.25');
    } finally {
      // Put the shared demo salon back for the other journeys.
      expect(await apiWrite(page, 'PUT', setupPaths.salon, original)).toBe(200);
      await page.context().close();
    }
  });

  it('the Products page fits a 375 px phone', async () => {
    const context = await browser.newContext({ viewport: { width: 375, height: 800 } });
    const page = await context.newPage();
    await signInThroughPage(page, 'owner@demo.test', DEMO_PASSWORD);
    await page.waitForURL(`${baseUrl()}/owner**`);
    await page.goto(`${baseUrl()}/owner/setup/products`);
    await page.getByRole('list', { name: 'Products' }).getByText('Finishing oil 50 ml', { exact: true }).waitFor();
    await page.getByRole('form', { name: 'New product' }).getByLabel('Name').waitFor();
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
    await screenshot(page, 'owner-setup-products-375', true);
    await context.close();
  });
});
