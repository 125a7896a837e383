/**
 * The Gauge log in a real browser against the real server and PostgreSQL (issue 6, deliver 4 and 7):
 * a line technician opens the released (signed) Line 2 check, uploads a wet-film gauge file, sees the
 * detected columns and the verdicts in the preview, saves it, and sees the Over and Close readings
 * flagged in the table and on the chart against the quiet window.
 */
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { newPage, screenshot, signIn } from './support/browser';
import { appAndBrowserForThisFile } from './support/app-and-browser';

const E2E_TIMEOUT = 180_000;

const e2e = appAndBrowserForThisFile(E2E_TIMEOUT);
let technician: { context: BrowserContext; page: Page };

beforeAll(async () => {
  technician = await newPage(e2e.browser, e2e.app.url, { width: 1280, height: 900 });
  await signIn(technician.page, 'technician@larkspur.example');
}, E2E_TIMEOUT);

// Runs before the shared hook closes the browser (after-hooks run in reverse order).
afterAll(async () => {
  await technician?.context.close();
}, E2E_TIMEOUT);

/** An invented run E-0501 on Line 2: 24 readings drifting from 52 µm down to 30 µm wet, every 5 m. */
function gaugeCsv(): string {
  const lines = ['Run,Position [m],WFT [µm],Operator'];
  for (let i = 0; i < 24; i += 1) lines.push(`E-0501,${5 * i},${(52 - (22 * i) / 23).toFixed(1)},M. Ruiz`);
  return lines.join('\n');
}

describe('gauge log for a line technician', () => {
  it(
    'uploads a gauge file, sees the verdicts in the preview, saves it and sees the flags and the chart',
    async () => {
      const { page } = technician;
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Gauge log' }).click();
      await page.getByRole('heading', { name: 'Gauge log', level: 1 }).waitFor();
      const released = page.getByRole('link', { name: /rev\. \d+/ }).first();
      await released.click();
      await page.getByRole('heading', { name: 'Upload gauge readings (CSV)' }).waitFor();

      await page.getByLabel('CSV file').setInputFiles({ name: 'line2-E-0501.csv', mimeType: 'text/csv', buffer: Buffer.from(gaugeCsv(), 'utf8') });
      const summary = page.getByTestId('preview-summary');
      await summary.waitFor();
      const text = await summary.innerText();
      expect(text).toMatch(/24 rows · 24 read cleanly · 0 with problems/);
      const over = Number(/Over (\d+)/.exec(text)?.[1]);
      expect(over).toBeGreaterThan(0);
      expect(await page.getByLabel('Thickness', { exact: true }).inputValue()).toBe('WFT [µm]');

      await page.getByRole('table', { name: 'First readings as they will be judged' }).waitFor();
      await page.getByRole('button', { name: /Save 24 readings/ }).click();
      await page.getByText('Saved 24 readings from line2-E-0501.csv').waitFor();
      await page.getByRole('button', { name: 'E-0501' }).waitFor();
      const runRow = page.getByRole('row').filter({ has: page.getByRole('button', { name: 'E-0501' }) });
      expect(await runRow.innerText()).toContain(`${over} Over`);

      await page.getByRole('combobox', { name: 'Verdict', exact: true }).selectOption('over');
      await page.getByRole('textbox', { name: 'Run', exact: true }).first().fill('E-0501');
      const readingRows = page.getByRole('table', { name: 'Judged readings' }).locator('tbody tr');
      await expect.poll(async () => readingRows.count(), { timeout: 15_000 }).toBe(over);
      for (const row of await readingRows.allInnerTexts()) expect(row).toMatch(/E-0501[\s\S]*Over/);

      const chart = page.getByRole('figure', { name: /Wet thickness of each reading/ });
      await chart.locator('.main-svg').first().waitFor({ timeout: 60_000 });
      await expect.poll(async () => chart.locator('.legendtext').allTextContents(), { timeout: 30_000 }).toEqual(expect.arrayContaining([expect.stringMatching(/^Over \(\d+\)$/)]));
      const labels = await chart.locator('.annotation-text').allTextContents();
      expect(labels.some((l) => /quiet thickness/.test(l))).toBe(true);
      await page.getByRole('heading', { name: /Thickness along the run/ }).scrollIntoViewIfNeeded();
      await screenshot(page, 'gauge-log');
    },
    E2E_TIMEOUT,
  );
});
