/**
 * The engineer's main workflow in the browser (issue 4, deliver 8): a Process engineer enters a
 * fluid typed in non-SI units, builds a layer check, and sees the regime, the margin and the quiet
 * window; a Line technician opens the same check and cannot change it.
 *
 * Expected numbers are worked by hand from the typed inputs and published values, never taken from
 * the code under test:
 * - 1 cP = 1 mPa·s = 0.001 Pa·s; 1 dyn/cm = 1 mN/m; 1 mil = 25.4 µm exactly; a temperature
 *   difference of 1 °F = 5/9 K; 68 °F = 293.15 K. Thompson A., Taylor B.N. (2008) NIST Special
 *   Publication 811, Appendix B.8 and B.9.
 * - Pearson J.R.A. (1958) "On convection cells induced by surface tension", J. Fluid Mech. 4:489–500:
 *   rigid conducting bottom, flat insulating free top (Bi = 0), no buoyancy → critical Ma = 79.607 at
 *   wavenumber k_c = 1.993 (values as tabulated in Nield D.A. (1964) J. Fluid Mech. 19:341–352).
 * - Ma = |dσ/dT|·ΔT·d/(μκ), κ = k/(ρ c_p) (Pearson 1958, eq. for the Marangoni number).
 * - Hexagon centre spacing for a hexagonal planform of wavenumber k: 4π d / (√3 k_c)
 *   (Chandrasekhar S. (1961) Hydrodynamic and Hydromagnetic Stability, §II.16, hexagonal cells).
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { wcagViolations } from './support/accessibility';
import { newPage, screenshot, screenshotDir, signIn } from './support/browser';
import { projectRoot } from '../../scripts/lib/project-root';
import { appAndBrowserForThisFile } from './support/app-and-browser';

const E2E_TIMEOUT = 240_000;
const CHART_WAIT = 45_000;

// Inputs as a person on a US line types them.
const fluidName = 'Larkspur test solvent, US units';
const typed = {
  referenceTemperature: '68 °F',
  density: '0.87 g/cm³',
  expansion: '0.0011 1/K',
  surfaceTension: '35 dyn/cm',
  surfaceTensionSlope: '-0.1 mN/(m·K)',
  conductivity: '0.15 W/(m·K)',
  heatCapacity: '1.8 kJ/(kg·K)',
  viscosity: '12 cP',
  depth: '2 mil',
  deltaT: '90 °F',
};

// Worked by hand (see the header): SI values of the typed inputs …
const rho = 870; // kg/m³
const cp = 1800; // J/(kg·K)
const k = 0.15; // W/(m·K)
const mu = 0.012; // Pa·s
const slope = 1e-4; // N/(m·K), magnitude
const depth = 2 * 25.4e-6; // m
const deltaT = (90 * 5) / 9; // K
// … and the Pearson-problem answer. Buoyancy: Ra ≈ 0.05 against a critical Ra of 669, a 0.01 % effect.
const kappa = k / (rho * cp);
const marangoni = (slope * deltaT * depth) / (mu * kappa); // ≈ 221.0
const expectedMargin = 79.607 / marangoni; // ≈ 0.360
const expectedSpacingMicrometres = ((4 * Math.PI * depth) / (Math.sqrt(3) * 1.993)) * 1e6; // ≈ 184.9 µm

const e2e = appAndBrowserForThisFile(E2E_TIMEOUT);
let checkUrl = '';

/** The number at the start of a shown value ("0.36×", "184.9 µm", "221.0"), thousands separators dropped. */
function leadingNumber(text: string): number {
  const match = /[−-]?[\d,]*\.?\d+/.exec(text.replace(/\u2212/g, '-'));
  if (!match) throw new Error(`no number in "${text}"`);
  return Number(match[0].replace(/,/g, ''));
}

/**
 * A full-page screenshot taken at a viewport as tall as the page, so the capture itself does not
 * resize the window (a resize makes the plot lay itself out again mid-capture).
 */
async function screenshotWholePage(page: Page, name: string): Promise<void> {
  const width = page.viewportSize()?.width ?? 1280;
  const height = await page.evaluate(() => document.documentElement.scrollHeight);
  await page.setViewportSize({ width, height });
  await page.waitForTimeout(1500);
  await screenshot(page, name);
}

async function fillProperty(page: Page, key: string, value: string, source: string, uncertainty: string) {
  const box = page.getByTestId(`property-${key}`);
  await box.getByLabel('Value with unit').fill(value);
  await box.getByLabel('Source').fill(source);
  await box.getByLabel('± %').fill(uncertainty);
}

describe('fluid library and layer check in the browser', () => {
  it('a Process engineer enters a fluid in US units, builds a check and sees the regime, margin and quiet window', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url, { width: 1360, height: 900 });
    try {
      await signIn(page, 'engineer@larkspur.example');
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Fluids' }).click();
      await page.getByRole('table').waitFor();
      await page.getByRole('link', { name: 'New fluid' }).click();

      // Arrange: a fluid typed in the units on the label of the drum.
      await page.getByLabel('Name', { exact: true }).fill(fluidName);
      await page.getByLabel('Kind', { exact: true }).selectOption('solvent');
      await page.getByLabel('Reference temperature T₀').fill(typed.referenceTemperature);
      await fillProperty(page, 'density', typed.density, 'Supplier sheet, invented for this test', '1');
      await fillProperty(page, 'expansion', typed.expansion, 'Invented for this test', '5');
      await fillProperty(page, 'surfaceTension', typed.surfaceTension, 'Invented for this test', '2');
      await fillProperty(page, 'surfaceTensionSlope', typed.surfaceTensionSlope, 'Invented for this test', '10');
      await fillProperty(page, 'conductivity', typed.conductivity, 'Invented for this test', '5');
      await fillProperty(page, 'heatCapacity', typed.heatCapacity, 'Invented for this test', '3');
      await page.getByLabel('Point 1: temperature').fill(typed.referenceTemperature);
      await page.getByLabel('Point 1: viscosity').fill(typed.viscosity);

      // The live note beside each box shows the SI value the server will store (NIST SP 811 factors).
      const siNote = (key: string) => page.getByTestId(`property-${key}`).getByTestId('parsed-si').first().innerText();
      expect(await siNote('surfaceTension')).toContain('= 0.03500 N/m');
      const viscosityNotes = page.getByTestId('property-viscosity').getByTestId('parsed-si');
      expect(await viscosityNotes.nth(0).innerText()).toMatch(/= 293\.[12] K · 20\.00 °C/); // 68 °F = 293.15 K = 20 °C
      expect(await viscosityNotes.nth(1).innerText()).toContain('= 0.01200 Pa·s · 12.00 mPa·s');

      await page.getByTestId('save-fluid').click();
      await page.waitForURL(/\/fluids\/[0-9a-f-]{36}$/);
      const summary = page.getByTestId('fluid-summary');
      await summary.waitFor();
      // Shown back in the person's units (coating floor by default): 12 cP = 12 mPa·s, 35 dyn/cm = 35 mN/m.
      expect(await summary.innerText()).toContain('12.00 mPa·s');
      expect(await summary.innerText()).toContain('35.00 mN/m');
      const fluidId = page.url().split('/').pop()!;

      // The library lists it, sortable and in the chosen units; US units switch the whole table.
      await page.goto('/fluids?q=Larkspur');
      await page.getByRole('link', { name: fluidName }).waitFor();
      await page.getByTestId('unit-system').selectOption('us');
      await expect.poll(() => page.getByRole('row', { name: new RegExp(fluidName) }).innerText()).toContain('35.00 dyn/cm');
      expect(await page.getByRole('row', { name: new RegExp(fluidName) }).innerText()).toContain('12.00 cP');
      await page.goto('/fluids');
      await page.getByRole('link', { name: fluidName }).waitFor();
      await screenshotWholePage(page, 'fluids');
      expect(await wcagViolations(page)).toEqual([]);
      await page.setViewportSize({ width: 1360, height: 900 });
      await page.getByTestId('unit-system').selectOption('floor');

      // Act: a drying-coat check on this fluid, 2 mil wet, 90 °F across the layer, flat insulating top.
      await page.goto(`/layer-checks/new?fluid=${fluidId}`);
      await page.getByLabel('Title', { exact: true }).fill('Line 2 primer, hot first zone (test)');
      await page.getByLabel('Evaluation temperature').fill(typed.referenceTemperature);
      await page.getByLabel('Layer depth (wet thickness)').fill(typed.depth);
      await page.getByLabel('The surface may deform (check long-wave thinning into dry spots)').uncheck();
      await page.getByLabel('Heat is given as').selectOption('deltaT');
      await page.getByLabel('ΔT bottom → surface').fill(typed.deltaT);
      await page.getByLabel('Top heat-transfer coefficient h (optional)').fill('');
      await page.getByLabel('Panel or web width (optional)').fill('600 mm');

      // Assert: the live verdict (debounced re-evaluation) matches Pearson's problem worked by hand.
      await expect
        .poll(async () => leadingNumber(await page.getByTestId('group-marangoni').innerText()), { timeout: 20_000 })
        .toBeCloseTo(marangoni, 0);
      const margin = leadingNumber(await page.getByTestId('margin-value').innerText());
      expect(Math.abs(margin - expectedMargin) / expectedMargin).toBeLessThan(0.02);
      expect(await page.getByTestId('margin-word').innerText()).toContain('Over');
      expect(await page.getByTestId('regime-label').innerText()).toBe('Surface-tension cells');
      const spacing = leadingNumber(await page.getByTestId('hexagon-spacing').innerText());
      expect(Math.abs(spacing - expectedSpacingMicrometres) / expectedSpacingMicrometres).toBeLessThan(0.02);
      expect(await page.getByTestId('cell-preview').locator('path').count()).toBeGreaterThan(0);
      expect(await page.getByTestId('closing-line').innerText()).toContain('local codes and qualified practice govern');
      expect(await page.getByTestId('cautions').innerText()).toContain('lower flammable limit');

      // The quiet window draws (the plotting bundle is large: generous wait).
      await page.getByTestId('quiet-window').locator('.main-svg').first().waitFor({ timeout: CHART_WAIT });
      expect(await page.getByTestId('quiet-window').getByText('Layer depth d [µm]').count()).toBeGreaterThan(0);
      expect(await page.getByTestId('window-sizing').innerText()).toMatch(/Largest quiet ΔT at this depth\s*[\d.]+ K/);

      await page.getByTestId('save-check').click();
      await page.waitForURL(/\/layer-checks\/[0-9a-f-]{36}$/);
      await page.getByTestId('check-meta').waitFor();
      expect(await page.getByTestId('check-meta').innerText()).toContain('revision 1');
      checkUrl = new URL(page.url()).pathname;
      await page.getByTestId('quiet-window').locator('.main-svg').first().waitFor({ timeout: CHART_WAIT });
      await page.getByTestId('margin-value').waitFor();
      await screenshotWholePage(page, 'layer-check');
      expect(await wcagViolations(page)).toEqual([]);
      await page.getByTestId('quiet-window').screenshot({ path: join(screenshotDir, 'quiet-window.png') });
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);

  it('a Line technician opens the same check and can read it but not change it', async () => {
    expect(checkUrl).toMatch(/^\/layer-checks\//);
    const { context, page } = await newPage(e2e.browser, e2e.app.url);
    try {
      await signIn(page, 'technician@larkspur.example');
      await page.goto(checkUrl);
      await page.getByTestId('margin-value').waitFor({ timeout: 20_000 });
      expect(await page.getByTestId('margin-word').innerText()).toContain('Over');
      expect(await page.getByTestId('save-check').count()).toBe(0);
      expect(await page.getByLabel('Title', { exact: true }).isEditable()).toBe(false);
      expect(await page.getByLabel('Layer depth (wet thickness)').isEditable()).toBe(false);
      expect(await page.getByText('only a Process engineer changes it').count()).toBe(1);
      expect(await wcagViolations(page)).toEqual([]);
      // No way to a new check either.
      await page.goto('/layer-checks');
      await page.getByRole('table').waitFor();
      expect(await page.getByRole('link', { name: 'New layer check' }).count()).toBe(0);
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);

  it('"Only my checks" keeps the engineer\'s own checks and stays in the address; a technician who owns none sees why the list is empty', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url);
    try {
      await signIn(page, 'engineer@larkspur.example');
      await page.goto('/layer-checks');
      await page.getByRole('table').waitFor();
      // The box follows the address, which changes once the filtered page has loaded: click, then wait.
      await page.getByLabel('Only my checks').click();
      await page.waitForURL(/owner=me/);
      await page.getByRole('table').waitFor();
      // Owner is the seventh column (Title, Process, Fluid, Depth, Saved margin, Regime, Owner, …).
      const owners = await page.locator('tbody tr td:nth-child(7)').allInnerTexts();
      expect(owners.length).toBeGreaterThan(0);
      expect(new Set(owners)).toEqual(new Set(['Priya Natarajan (Process engineer)']));
      expect(await wcagViolations(page)).toEqual([]);
      // Sorting by the saved margin goes to the server and into the address; the rows come back in order.
      await page.getByRole('button', { name: /Saved margin/ }).click();
      await page.waitForURL(/sort=margin/);
      await page.locator('th[aria-sort]', { hasText: 'Saved margin' }).waitFor();
      const direction = new URL(page.url()).searchParams.get('dir');
      const margins = (await page.locator('tbody tr td:nth-child(5)').allInnerTexts())
        .map((text) => (text.startsWith('no onset') ? Infinity : Number.parseFloat(text)));
      const ordered = [...margins].sort((a, b) => (direction === 'desc' ? b - a : a - b));
      expect(margins).toEqual(ordered);
      await screenshotWholePage(page, 'layer-checks-mine');
      await page.reload();
      expect(await page.getByLabel('Only my checks').isChecked()).toBe(true);
    } finally {
      await context.close();
    }
    const technician = await newPage(e2e.browser, e2e.app.url);
    try {
      await signIn(technician.page, 'technician@larkspur.example');
      await technician.page.goto('/layer-checks?owner=me');
      await technician.page.getByText('“Only my checks”', { exact: false }).waitFor();
      expect(await technician.page.getByRole('table').count()).toBe(0);
    } finally {
      await technician.context.close();
    }
  }, E2E_TIMEOUT);

  it('a stale save is refused: the second engineer is told someone saved a newer revision and can reload it', async () => {
    expect(checkUrl).toMatch(/^\/layer-checks\//);
    const first = await newPage(e2e.browser, e2e.app.url);
    const second = await newPage(e2e.browser, e2e.app.url);
    try {
      for (const { page } of [first, second]) {
        await signIn(page, 'engineer@larkspur.example');
        await page.goto(checkUrl);
        await page.getByTestId('check-meta').waitFor();
      }
      // Both hold revision 1. The first saves a thinner coat: revision 2.
      await first.page.getByLabel('Layer depth (wet thickness)').fill('1.5 mil');
      await first.page.getByTestId('save-check').click();
      await first.page.getByText('Revision 2 is stored.').waitFor();
      expect(await first.page.getByTestId('check-meta').innerText()).toContain('revision 2');

      // The second, still on revision 1, saves a new title and is refused.
      await second.page.getByLabel('Title', { exact: true }).fill('Line 2 primer, renamed on a stale page');
      await second.page.getByTestId('save-check').click();
      await second.page.getByTestId('conflict').waitFor();
      expect(await second.page.getByTestId('conflict').innerText()).toContain('revision 2');
      // Until reloaded, the page still says which revision the person is editing.
      expect(await second.page.getByTestId('check-meta').innerText()).toContain('revision 1');
      await second.page.getByRole('button', { name: 'Reload the newer version' }).click();
      await expect.poll(() => second.page.getByTestId('check-meta').innerText()).toContain('revision 2');
      expect(await second.page.getByLabel('Layer depth (wet thickness)').inputValue()).toBe('1.5 mil');
      expect(await second.page.getByLabel('Title', { exact: true }).inputValue()).toBe('Line 2 primer, hot first zone (test)');
      expect(await second.page.getByTestId('conflict').count()).toBe(0);
    } finally {
      await first.context.close();
      await second.context.close();
    }
  }, E2E_TIMEOUT);

  it('a CSV import shows line-numbered problems first and saves nothing until the file is clean', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url);
    try {
      await signIn(page, 'engineer@larkspur.example');
      await page.goto('/fluids');
      await page.getByRole('table').waitFor();
      // Start from the export, as the page suggests: its header is the import format.
      const exported = await page.evaluate(async () => (await fetch('/api/fluids/export.csv')).text());
      const header = exported.split(/\r?\n/)[0]!;
      const columns = header.split(',');
      const row = (name: string, density: string) => {
        const cells: Record<string, string> = {
          name, kind: 'solvent', reference_temperature: '20 °C', density, density_uncertainty_pct: '1', density_distribution: 'normal',
          expansion: '0.001 1/K', surface_tension: '28 dyn/cm', surface_tension_slope: '-0.1 mN/(m·K)', conductivity: '0.13 W/(m·K)',
          heat_capacity: '1.7 kJ/(kg·K)', viscosity_points: '20 °C = 0.6 cP',
        };
        return columns.map((column) => cells[column] ?? '').join(',');
      };
      const upload = (lines: string[]) =>
        page.getByTestId('fluid-csv-file').setInputFiles({ name: 'fluids.csv', mimeType: 'text/csv', buffer: Buffer.from([header, ...lines].join('\n')) });

      await upload([row('Imported solvent A', '0.86 g/cm³'), row('Imported solvent B', '-5 kg/m³')]);
      await page.getByTestId('fluid-csv-errors').waitFor();
      expect(await page.getByTestId('fluid-csv-errors').innerText()).toMatch(/Line 3\b/);
      expect(await page.getByRole('button', { name: /^Import \d+ fluids?$/ }).count()).toBe(0);

      await upload([row('Imported solvent A', '0.86 g/cm³'), row('Imported solvent B', '860 kg/m³')]);
      await page.getByRole('button', { name: 'Import 2 fluids' }).click();
      await page.getByText('2 fluids were added to the library.').waitFor();
      await page.goto('/fluids?q=Imported');
      await expect.poll(() => page.getByRole('link', { name: /Imported solvent/ }).count()).toBe(2);
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);

  it('the batch page evaluates the onset command’s CSV fixture and flags rows with errors', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url);
    try {
      await signIn(page, 'engineer@larkspur.example');
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Batch' }).click();
      const csv = readFileSync(join(projectRoot, 'tests', 'fixtures', 'onset', 'cases.csv'), 'utf8');
      const broken = `${csv.trimEnd()}\nbad-row,rigid,conducting,lid,1000,,,,,,,,,,,,,\n`;
      await page.getByTestId('batch-file').setInputFiles({ name: 'cases.csv', mimeType: 'text/csv', buffer: Buffer.from(broken) });
      await page.getByTestId('batch-run').click();
      const results = page.getByTestId('batch-results');
      await results.waitFor({ timeout: 30_000 });
      const text = await results.innerText();
      // Pearson (1958): Ma = 39.8035 on a Bi = 0 rigid conducting bottom is half the critical 79.607 → margin 2.
      expect(text).toContain('6 cases · 2 with errors');
      const rowText = async (id: string) => (await results.getByRole('row', { name: new RegExp(`^${id}\\b`) }).innerText()).replace(/\s+/g, ' ');
      expect(await rowText('pearson-half')).toMatch(/Quiet 2(\.0+)?× /);
      expect(await rowText('bad-row')).toMatch(/Error ✕ top: .*"lid"/);
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);
});
