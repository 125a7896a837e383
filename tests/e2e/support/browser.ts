/**
 * Browser helpers for end-to-end tests: Debian's Chromium driven by playwright-core, signing in
 * through the real form, and screenshots under test-output/screenshots.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { projectRoot } from '../../../scripts/lib/project-root';

/** Password of every demo account (seeded in demo mode; issue 2 "Demo sign-ins"). */
export const DEMO_PASSWORD = 'quietlayer-demo';

export const screenshotDir = join(projectRoot, 'test-output', 'screenshots');

/** Chromium without sandbox (root) and without background traffic (the network is closed here). */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: '/usr/bin/chromium',
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
}

/** A fresh context (own cookies) at a tablet-friendly laptop size, with the app's base URL. */
export async function newPage(browser: Browser, baseURL: string, viewport = { width: 1280, height: 860 }): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ baseURL, viewport, timezoneId: 'UTC', locale: 'en-GB' });
  context.setDefaultTimeout(15_000);
  const page = await context.newPage();
  return { context, page };
}

/** Signs in through the sign-in form and waits until the signed-in frame is shown. */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  if (!page.url().includes('/sign-in')) await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
}

/** Signs out through the user menu and waits for the sign-in page. */
export async function signOut(page: Page): Promise<void> {
  await page.getByTestId('user-menu-toggle').click();
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.waitForURL(/\/sign-in/);
}

/** Link texts of the main navigation, in order. */
export async function navigationLabels(page: Page): Promise<string[]> {
  const links = page.getByRole('navigation', { name: 'Main' }).getByRole('link');
  return (await links.allInnerTexts()).map((text) => text.trim());
}

/** Saves a full-page screenshot as test-output/screenshots/<name>.png and returns its path. */
export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(screenshotDir, { recursive: true });
  const path = join(screenshotDir, `${name}.png`);
  await page.evaluate(() => document.fonts.ready);
  await page.screenshot({ path, fullPage: true });
  return path;
}
