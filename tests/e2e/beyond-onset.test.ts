/**
 * Beyond onset in the browser (issue 7): the Drying path page, the Property spread section (inline
 * and queued with its progress) and the Melt pool flow page, as the demo process engineer, with
 * screenshots under test-output/screenshots/ and an axe WCAG 2.1 AA check of each page.
 * The Larkspur Coatings demo data (Line 2, the weld cell and its two heats) are invented.
 */
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { wcagViolations } from './support/accessibility';
import { newPage, screenshot, signIn } from './support/browser';
import { appAndBrowserForThisFile } from './support/app-and-browser';

const E2E_TIMEOUT = 180_000;
/** The plotting bundle takes several seconds to evaluate here (STACK.md): wait generously. */
const PLOT_WAIT = 45_000;

const e2e = appAndBrowserForThisFile(E2E_TIMEOUT);

async function waitForPlots(page: Page, count: number) {
  await page.waitForFunction((n) => document.querySelectorAll('[data-testid="plot"] .main-svg').length >= n, count, { timeout: PLOT_WAIT });
}

describe('Drying path page', () => {
  it('computes the Line 2 demo path with the verdict, zone table, ventilation caution and three plots with the zones shaded', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url, { width: 1440, height: 900 });
    try {
      await signIn(page, 'engineer@larkspur.example');
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Drying path' }).click();
      await page.getByRole('heading', { name: 'Verdict' }).waitFor({ timeout: 30_000 });
      await expect(page.getByRole('heading', { name: 'Zone by zone' }).isVisible()).resolves.toBe(true);
      const caution = page.getByText('Caution: solvent vapour and ventilation');
      await expect(caution.isVisible()).resolves.toBe(true);
      await expect(page.getByText(/NFPA 86 \/ EN 1539/).first().isVisible()).resolves.toBe(true);
      await expect(page.getByText(/not a safety design tool/).first().isVisible()).resolves.toBe(true);
      const zoneRows = page.getByRole('table').filter({ hasText: 'Fresh air for' }).locator('tbody tr');
      await expect(zoneRows.count()).resolves.toBe(3);
      await waitForPlots(page, 3);
      // Three zones shaded on each of the three plots.
      await expect(page.locator('[data-testid="plot"]').first().locator('.layer-below .shapelayer path').count()).resolves.toBe(3);
      await screenshot(page, 'beyond-onset-drying-path');

      await page.getByLabel('Against time').check();
      await page.waitForFunction(() => [...document.querySelectorAll('.xtitle')].some((t) => t.textContent === 'Time [s]'), undefined, { timeout: PLOT_WAIT });

      // A bad unit is named beside its field after the server answers 400.
      await page.getByLabel('Wet thickness').fill('40 kg');
      await page.getByRole('button', { name: 'Compute the drying path' }).click();
      await page.getByText('These inputs could not be computed; the last drying path is shown').waitFor();
      await screenshot(page, 'beyond-onset-drying-path-error');
      expect(await wcagViolations(page)).toEqual([]);
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);
});

describe('Property spread section', () => {
  it('runs a seeded spread inline, shows the onset probability, percentiles and sensitivity chart, then a queued run with a progress bar', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url, { width: 1280, height: 900 });
    try {
      await signIn(page, 'engineer@larkspur.example');
      await page.goto('/property-spread');
      const select = page.getByLabel('Layer check');
      await select.waitFor();
      // The weld-cell check (invented demo): its margin is finite, so the spread has something to show.
      await select.selectOption((await select.locator('option', { hasText: 'Tube-to-elbow' }).getAttribute('value')) as string);
      await page.getByLabel('Samples').fill('5000');
      await page.getByLabel('Seed').fill('7');
      await page.getByRole('button', { name: 'Run the spread' }).click();
      await page.getByText('Probability of onset').waitFor({ timeout: 90_000 });
      await page.getByText('Seed 7: the same seed reproduces these figures.').waitFor();
      await waitForPlots(page, 1);
      await screenshot(page, 'beyond-onset-property-spread');
      expect(await wcagViolations(page)).toEqual([]);

      // A queued run (its margin has a validated response surface, so 40,000 samples are quick).
      await page.getByLabel('Samples').fill('40000');
      await page.getByLabel('Seed').fill('8');
      await page.getByRole('button', { name: 'Queue the spread' }).click();
      const bar = page.getByRole('progressbar', { name: 'Property spread progress' });
      await bar.waitFor({ timeout: 15_000 });
      await screenshot(page, 'beyond-onset-property-spread-queued');
      await page.getByText('Seed 8: the same seed reproduces these figures.').waitFor({ timeout: 120_000 });
      await expect(bar.count()).resolves.toBe(0);
      await screenshot(page, 'beyond-onset-property-spread-queued-done');
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);
});

describe('Melt pool flow page', () => {
  it('shows the σ(T) curve, the flow verdict, the welding cautions, the heats register and the sulfur warning for the demo heats', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url, { width: 1440, height: 900 });
    try {
      await signIn(page, 'engineer@larkspur.example');
      await page.goto('/melt-pool');
      await page.getByRole('heading', { name: 'Melt pool flow' }).first().waitFor();
      await page.getByText('Welding cautions').waitFor({ timeout: 30_000 });
      await expect(page.getByText(/hexavalent chromium/).first().isVisible()).resolves.toBe(true);
      await waitForPlots(page, 1);
      await expect(page.getByRole('cell', { name: 'LK-H24-0173', exact: true }).first().isVisible()).resolves.toBe(true);

      const join = page.getByRole('region', { name: 'Parts to be joined' });
      const check = join.getByLabel('Melt-pool check');
      await check.selectOption((await check.locator('option', { hasText: 'Tube-to-elbow' }).getAttribute('value')) as string);
      const firstHeat = join.getByLabel('First heat');
      await firstHeat.selectOption((await firstHeat.locator('option', { hasText: 'LK-H24-0173' }).getAttribute('value')) as string);
      const secondHeat = join.getByLabel('Second heat');
      await secondHeat.selectOption((await secondHeat.locator('option', { hasText: 'LK-H24-0391' }).getAttribute('value')) as string);
      const saved = page.waitForResponse((r) => r.request().method() === 'POST' && /\/api\/layer-checks\/[^/]+\/melt-pool$/.test(r.url()));
      await join.getByRole('button', { name: 'Link the heats and this pool to the check' }).click();
      expect((await saved).status()).toBe(201);
      await page.getByText("The joined parts' sulfur moves the flow").waitFor();
      await join.getByRole('button', { name: 'Link the heats and this pool to the check' }).and(page.locator(':not([aria-busy])')).waitFor();
      await screenshot(page, 'beyond-onset-melt-pool');
      expect(await wcagViolations(page)).toEqual([]);
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);

  it('lets a line technician read but not change: no save, run or add controls', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url);
    try {
      await signIn(page, 'technician@larkspur.example');
      await page.goto('/melt-pool');
      await page.getByText('Welding cautions').waitFor({ timeout: 30_000 });
      await expect(page.getByRole('button', { name: 'Add heat' }).count()).resolves.toBe(0);
      await page.goto('/property-spread');
      await page.getByText('Process engineers run spreads').waitFor();
      await page.goto('/drying-path');
      await page.getByRole('heading', { name: 'Verdict' }).waitFor({ timeout: 30_000 });
      await expect(page.getByRole('button', { name: 'Save with this check revision' }).count()).resolves.toBe(0);
      await screenshot(page, 'beyond-onset-drying-path-technician');
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);
});
