import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { inject } from 'vitest';

export const screenshotDir = join(process.cwd(), 'tests', 'output', 'screenshots');

/** Connects to the suite's shared Chromium. */
export async function connectBrowser(): Promise<Browser> {
  mkdirSync(screenshotDir, { recursive: true });
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
