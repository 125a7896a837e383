/**
 * In the browser (Debian Chromium), with the server's real Content-Security-Policy:
 *   - a plot draws (the plotting library adds its style rules through the CSSOM, which style-src
 *     does not govern) and the page reports no CSP violation at all;
 *   - script-looking text typed into free-text fields (fluid name and notes, layer check title and
 *     notes, process sheet line and purpose) is shown literally and never runs, in pages and in the PDF.
 * XSS payloads follow the OWASP Foundation "XSS Filter Evasion Cheat Sheet".
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { demoFluidInputs } from '../../scripts/lib/seed/demo-fluids';
import { newPage, screenshot, signIn } from '../e2e/support/browser';
import { appAndBrowserForThisFile } from '../e2e/support/app-and-browser';

const E2E_TIMEOUT = 180_000;
const PLOT_WAIT = 60_000;
const PAYLOAD = '<img src=x onerror=window.__xss=1>';
const PAYLOAD_2 = '"><svg onload=window.__xss=2>';
const PAYLOAD_3 = "<script>window.__xss=3</script>";

const e2e = appAndBrowserForThisFile(E2E_TIMEOUT);

/** Collects every CSP violation the page reports (event and console), from before any script runs. */
async function watchViolations(page: Page): Promise<() => Promise<string[]>> {
  const consoleViolations: string[] = [];
  page.on('console', (message) => {
    if (/Content Security Policy|Refused to (apply|execute|load)/i.test(message.text())) consoleViolations.push(message.text());
  });
  await page.addInitScript(() => {
    const list: string[] = [];
    (window as unknown as { __cspViolations: string[] }).__cspViolations = list;
    document.addEventListener('securitypolicyviolation', (event) => list.push(`${event.violatedDirective} ${event.blockedURI} ${event.sample} at ${event.sourceFile}:${event.lineNumber}:${event.columnNumber}`));
  });
  return async () => [...consoleViolations, ...(await page.evaluate(() => (window as unknown as { __cspViolations: string[] }).__cspViolations ?? []))];
}

describe('Content-Security-Policy in the browser', () => {
  it('serves the page under the strict policy, draws the drying-path plots, and reports no violation', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url, { width: 1440, height: 900 });
    try {
      const violations = await watchViolations(page);
      const response = await page.goto('/sign-in');
      const policy = response?.headers()['content-security-policy'] ?? '';
      expect(policy).toMatch(/script-src 'self'(;|$)/);
      expect(policy).toMatch(/style-src 'self' 'sha256-/);
      expect(policy).not.toMatch(/unsafe-inline|unsafe-eval/);
      await signIn(page, 'engineer@larkspur.example');
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Drying path' }).click();
      await page.waitForFunction(() => document.querySelectorAll('[data-testid="plot"] .main-svg').length >= 1, undefined, { timeout: PLOT_WAIT });
      // The plotting library's own rules took effect: its mode bar is laid out by them (position absolute).
      const plotted = await page.evaluate(() => {
        const svg = document.querySelector('[data-testid="plot"] .main-svg') as SVGElement | null;
        const traces = document.querySelectorAll('[data-testid="plot"] .scatterlayer .trace').length;
        const modebar = document.querySelector('[data-testid="plot"] .modebar-container') as HTMLElement | null;
        return { width: svg?.getBoundingClientRect().width ?? 0, traces, modebarPosition: modebar ? getComputedStyle(modebar).position : 'none' };
      });
      expect(plotted.width).toBeGreaterThan(100);
      expect(plotted.traces).toBeGreaterThan(0);
      expect(plotted.modebarPosition).toBe('absolute');
      await screenshot(page, 'hardening-plot-under-csp');
      expect(await violations()).toEqual([]);
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);

  it('blocks an injected inline script (the policy is really enforced)', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url);
    try {
      const violations = await watchViolations(page);
      await page.goto('/sign-in');
      await page.evaluate(() => {
        const script = document.createElement('script');
        script.textContent = 'window.__inline = 1';
        document.head.appendChild(script);
      });
      expect(await page.evaluate(() => (window as unknown as { __inline?: number }).__inline)).toBeUndefined();
      expect((await violations()).some((v) => /script-src/.test(v))).toBe(true);
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);
});

describe('script-looking text in free-text fields', () => {
  it('shows it literally and never runs it: fluid, layer check and process sheet pages, and the sheet PDF', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url, { width: 1280, height: 900 });
    try {
      const violations = await watchViolations(page);
      await signIn(page, 'engineer@larkspur.example');
      const api = context.request;
      const fluid = await api.post('/api/fluids', { data: { ...demoFluidInputs()[0], name: PAYLOAD, notes: `${PAYLOAD_2} ${PAYLOAD_3}` } });
      expect(fluid.status()).toBe(201);
      const fluidId = (await fluid.json()).id as string;
      const check = await api.post('/api/layer-checks', {
        data: {
          title: PAYLOAD,
          notes: `${PAYLOAD_2} ${PAYLOAD_3}`,
          fluidId,
          processKind: 'drying-coat',
          temperature: '35 °C',
          depth: '60 µm',
          bottom: { mechanics: 'rigid', thermal: 'conducting' },
          top: 'surface',
          heating: { mode: 'deltaT', deltaT: '1 K' },
        },
      });
      expect(check.status()).toBe(201);
      const checkId = (await check.json()).id as string;
      const sheet = await api.post('/api/sheets', { data: { checkId, line: PAYLOAD_2, purpose: `${PAYLOAD} ${PAYLOAD_3}` } });
      expect(sheet.status()).toBe(201);
      const sheetId = (await sheet.json()).id as string;

      for (const path of ['/fluids', `/fluids/${fluidId}`, '/layer-checks', `/layer-checks/${checkId}`, '/sheets', `/sheets/${sheetId}`]) {
        await page.goto(path);
        // Visible text only: the sheet list's line filter also lists the payload, in a hidden <option>
        // that comes first in the page and may load before or after the table.
        await page
          .getByText(path.includes('sheets') ? PAYLOAD_2 : PAYLOAD)
          .filter({ visible: true })
          .first()
          .waitFor({ timeout: 30_000 });
        await page.waitForTimeout(300); // let any injected handler fire if it could
        expect({ path, xss: await page.evaluate(() => (window as unknown as { __xss?: number }).__xss) }).toEqual({ path, xss: undefined });
        expect(await page.locator('img[src="x"], svg[onload], script:not([src])').count(), path).toBe(0);
      }
      await screenshot(page, 'hardening-xss-inert-sheet');
      expect(await violations()).toEqual([]);

      const pdf = await api.get(`/api/sheets/${sheetId}/pdf`);
      expect(pdf.status()).toBe(200);
      const dir = mkdtempSync(join(tmpdir(), 'quietlayer-xss-pdf-'));
      const file = join(dir, 'sheet.pdf');
      writeFileSync(file, Buffer.from(await pdf.body()));
      const text = execFileSync('pdftotext', ['-raw', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
      for (const payload of [PAYLOAD, PAYLOAD_2, PAYLOAD_3]) expect(text).toContain(payload);
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);
});
