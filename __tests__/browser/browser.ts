import fs from 'node:fs';
import path from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

export const BASE_URL = process.env.DILATO_BASE_URL ?? 'http://localhost:8080';
export const OUTPUT_DIR = path.resolve(__dirname, '..', '..', 'test-output', 'browser');

export const PHONE = { width: 390, height: 844 };
export const DESKTOP = { width: 1280, height: 800 };

/**
 * Debian's Chromium, never a test tool's own download; flags keep it off the closed network.
 * Playwright gives every launch a fresh, empty profile of its own.
 */
export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: '/usr/bin/chromium',
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

export async function newPage(browser: Browser, viewport = PHONE): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ viewport, baseURL: BASE_URL });
  const page = await context.newPage();
  const errors: string[] = [];
  page.on('pageerror', (err) => errors.push(err.message));
  (page as Page & { pageErrors?: string[] }).pageErrors = errors;
  return { context, page };
}

export function pageErrors(page: Page): string[] {
  return (page as Page & { pageErrors?: string[] }).pageErrors ?? [];
}

export async function screenshot(page: Page, name: string) {
  fs.mkdirSync(OUTPUT_DIR, { recursive: true });
  await page.screenshot({ path: path.join(OUTPUT_DIR, `${name}.png`), fullPage: true });
}

export async function signIn(page: Page, email: string, password = 'dilato-demo') {
  await page.goto('/sign-in');
  await page.getByLabel('Email', { exact: true }).fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
}
