/**
 * Accessibility of every page: axe-core (Deque Systems) with the WCAG 2.1 A/AA rules on each page
 * of the navigation, signed in as each demo role, plus the public pages and one detail page of each
 * record type. No violation of impact "serious" or "critical" is allowed (W3C 2018, "Web Content
 * Accessibility Guidelines (WCAG) 2.1"). The page list comes from src/config/navigation.ts, so a new
 * nav entry is checked without touching this file.
 */
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { navigationFor } from '../../src/config/navigation';
import type { Role } from '../../shared/schemas/roles';
import { wcagViolations, type AxeViolation } from './support/accessibility';
import { newPage, signIn } from './support/browser';
import { appAndBrowserForThisFile } from './support/app-and-browser';

const E2E_TIMEOUT = 300_000;
const demoRoles: ReadonlyArray<{ role: Role; email: string }> = [
  { role: 'administrator', email: 'admin@larkspur.example' },
  { role: 'engineer', email: 'engineer@larkspur.example' },
  { role: 'technician', email: 'technician@larkspur.example' },
  { role: 'reviewer', email: 'reviewer@larkspur.example' },
];

const e2e = appAndBrowserForThisFile(E2E_TIMEOUT);

/** Waits until the page has a level-1 heading and no request has been running for a moment. */
async function settle(page: Page): Promise<void> {
  await page.getByRole('heading', { level: 1 }).first().waitFor({ timeout: 30_000 });
  await page.waitForLoadState('networkidle', { timeout: 30_000 }).catch(() => {});
}

const serious = (violations: AxeViolation[]) => violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');

describe('axe-core on every page', () => {
  it('public pages: sign-in, forgot password, reset password, accept invitation, not found', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url);
    try {
      const found: Record<string, AxeViolation[]> = {};
      for (const path of ['/sign-in', '/forgot-password', '/reset-password?token=not-a-real-token-but-long-enough', '/accept-invitation?token=not-a-real-token-but-long-enough', '/no-such-page']) {
        await page.goto(path);
        await settle(page);
        found[path] = serious(await wcagViolations(page));
      }
      expect(found).toEqual(Object.fromEntries(Object.keys(found).map((k) => [k, []])));
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);

  for (const demo of demoRoles) {
    it(`every navigation page as ${demo.role}`, async () => {
      const { context, page } = await newPage(e2e.browser, e2e.app.url, { width: 1280, height: 900 });
      try {
        await signIn(page, demo.email);
        const items = navigationFor(demo.role);
        expect(items.length).toBeGreaterThan(1);
        const found: Record<string, AxeViolation[]> = {};
        for (const item of items) {
          await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: item.label, exact: true }).click();
          await page.waitForURL((url) => url.pathname === item.to);
          await settle(page);
          found[item.label] = serious(await wcagViolations(page));
        }
        expect(found).toEqual(Object.fromEntries(items.map((item) => [item.label, []])));
      } finally {
        await context.close();
      }
    }, E2E_TIMEOUT);
  }

  it('detail pages: a fluid, a layer check, a process sheet (as the process engineer)', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url, { width: 1280, height: 900 });
    try {
      await signIn(page, 'engineer@larkspur.example');
      const api = context.request;
      const fluid = (await (await api.get('/api/fluids?pageSize=1')).json()).items[0];
      const check = await api.post('/api/layer-checks', {
        data: {
          title: 'Line 4 topcoat, accessibility check',
          fluidId: fluid.id,
          processKind: 'drying-coat',
          temperature: '35 °C',
          depth: '60 µm',
          bottom: { mechanics: 'rigid', thermal: 'conducting' },
          top: 'surface',
          heating: { mode: 'deltaT', deltaT: '1 K' },
        },
      });
      expect(check.status()).toBe(201);
      const checkId = (await check.json()).id;
      const sheet = await api.post('/api/sheets', { data: { checkId, line: 'Line 4', purpose: 'Release the topcoat at 60 µm wet.' } });
      expect(sheet.status()).toBe(201);
      const sheetId = (await sheet.json()).id;
      const found: Record<string, AxeViolation[]> = {};
      for (const path of [`/fluids/${fluid.id}`, `/layer-checks/${checkId}`, `/sheets/${sheetId}`]) {
        await page.goto(path);
        await settle(page);
        found[path] = serious(await wcagViolations(page));
      }
      expect(found).toEqual(Object.fromEntries(Object.keys(found).map((k) => [k, []])));
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);
});
