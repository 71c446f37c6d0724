import { AxeBuilder } from '@axe-core/playwright';
import { copyFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { DEMO_PASSWORD } from '@server/demo/demo-catalogue';
import { expect, inject } from 'vitest';

export const screenshotDir = join(process.cwd(), 'tests', 'output', 'screenshots');
const docsScreenshots = join(process.cwd(), 'docs', 'screenshots');

/** Connects to the suite's shared Chromium. */
export async function connectBrowser(): Promise<Browser> {
  mkdirSync(screenshotDir, { recursive: true });
  mkdirSync(docsScreenshots, { recursive: true });
  return chromium.connect(inject('wsEndpoint'));
}

export const baseUrl = () => inject('baseUrl');

/** Signs in through the sign-in page, as a person would. */
export async function signInThroughPage(page: Page, email: string, password: string): Promise<void> {
  await page.goto(`${baseUrl()}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/** A demo user's page at desktop size, signed in through the sign-in page and arrived at their home `path`. */
export async function signedInPage(browser: Browser, email: string, path: string): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  await signInThroughPage(page, email, DEMO_PASSWORD);
  await page.waitForURL(`${baseUrl()}${path}**`);
  return page;
}

/**
 * A screenshot in the test output (the whole page unless `fullPage` is false, e.g. for a page whose lists
 * grow long); `forDocs` also copies it into docs/screenshots.
 */
export async function screenshot(page: Page, name: string, forDocs = false, fullPage = true): Promise<void> {
  const file = join(screenshotDir, `${name}.png`);
  await page.screenshot({ path: file, fullPage });
  if (forDocs) copyFileSync(file, join(docsScreenshots, `${name}.png`));
}

/** A write through the API with this page's session (e.g. to change the shared demo salon and put it back after). */
export async function apiWrite(page: Page, method: 'PUT' | 'POST', path: string, body: unknown): Promise<number> {
  const { token } = await (await page.request.get(`${baseUrl()}/api/csrf`)).json();
  const res = await page.request.fetch(`${baseUrl()}${path}`, { method, data: body, headers: { 'X-CSRF-Token': token } });
  return res.status();
}

/** axe-core's tags for the WCAG 2.0, 2.1 and 2.2 A and AA rules (Deque's rules for automated checks). */
export const WCAG_TAGS = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'];

/** Serious or critical WCAG 2.x A/AA violations on the page, each as `where: rule (elements)` (axe-core, Deque's rules). */
export async function seriousFindings(page: Page, where: string): Promise<string[]> {
  const axe = await new AxeBuilder({ page }).withTags(WCAG_TAGS).analyze();
  return axe.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${where}: ${v.id} (${v.nodes.map((n) => n.target.join(' ')).join(', ')})`);
}

/** No serious or critical WCAG 2.x A/AA violations (axe-core, Deque's rules for automated checks). */
export async function expectAccessible(page: Page): Promise<void> {
  const result = await new AxeBuilder({ page }).withTags(WCAG_TAGS).analyze();
  expect(result.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => v.id)).toEqual([]);
}
