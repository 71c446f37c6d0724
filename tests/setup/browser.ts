import { copyFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { inject } from 'vitest';

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

/** A full-page screenshot in the test output; `forDocs` also copies it into docs/screenshots. */
export async function screenshot(page: Page, name: string, forDocs = false): Promise<void> {
  const file = join(screenshotDir, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  if (forDocs) copyFileSync(file, join(docsScreenshots, `${name}.png`));
}
