import { gzipSync } from 'node:zlib';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, connectBrowser } from '../setup/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(() => browser.close());

// Text each library keeps through minification: the phone-number metadata's keys, luxon's name for an invalid
// date, rrule's refusal of a rule it cannot read, zod's class names. None of them is needed to show a salon's
// public page (its calls go through Addresses, shared/api/first-load-addresses.ts).
const LIBRARY_MARKS = {
  'libphonenumber-js metadata': 'country_calling_codes',
  zod: '$ZodType',
  luxon: 'Invalid DateTime',
  rrule: 'Unsupported RFC prop',
};

// What the public page may load at most (gzip); `npm run bench:web` measures it under a slow connection.
const PUBLIC_PAGE_JS_BUDGET_KB = 120;

describe('the public salon page on a first visit', () => {
  it('paints the frame before the app runs, and loads only what the page needs', async () => {
    const context = await browser.newContext({ viewport: { width: 375, height: 800 } });
    const page = await context.newPage();
    const scripts: Promise<{ url: string; body: Buffer }>[] = [];
    page.on('response', (response) => {
      if (response.request().resourceType() === 'script') scripts.push(response.body().then((body) => ({ url: response.url(), body })));
    });
    // The served HTML already holds the header, so something paints before any script has run.
    const html = await (await fetch(`${baseUrl()}/salon/kestrel-and-pine`)).text();
    expect(html).toMatch(/<header[^>]*>[\s\S]*Dwell[\s\S]*<\/header>/);

    await page.goto(`${baseUrl()}/salon/kestrel-and-pine`);
    await page.getByRole('heading', { level: 1, name: 'Kestrel & Pine Hair Studio' }).waitFor();
    await page.waitForLoadState('networkidle');
    const loaded = await Promise.all(scripts);
    const text = loaded.map((s) => s.body.toString('utf8')).join('\n');
    for (const [library, mark] of Object.entries(LIBRARY_MARKS)) expect(text.includes(mark), `${library} is loaded`).toBe(false);
    const gzipKb = loaded.reduce((sum, s) => sum + gzipSync(s.body).length, 0) / 1024;
    expect(gzipKb).toBeLessThanOrEqual(PUBLIC_PAGE_JS_BUDGET_KB);
    await context.close();
  });
});
