/**
 * Every demo role signs in through the browser and sees exactly the navigation its role allows
 * (issue 2 "Foundation", deliver 5 and 11; navigation by role from the foundation API contract:
 * everyone Home; administrator also Users, Audit trail, Outbox). Role labels are QuietLayer's own
 * vocabulary (DESIGN.md: Administrator / Process engineer / Line technician / QA reviewer).
 * Later features add their own entries to src/config/navigation.ts: the foundation entries are
 * checked against the contract's list written out here, and the whole bar against that config.
 */
import { describe, expect, it } from 'vitest';
import { navigationFor } from '../../src/config/navigation';
import { wcagViolations } from './support/accessibility';
import { navigationLabels, newPage, screenshot, signIn, signOut } from './support/browser';
import { appAndBrowserForThisFile } from './support/app-and-browser';

const E2E_TIMEOUT = 120_000;

const foundationLabels = ['Home', 'Users', 'Audit trail', 'Outbox'];

const demoRoles = [
  { role: 'administrator', email: 'admin@larkspur.example', label: 'Administrator', nav: ['Home', 'Users', 'Audit trail', 'Outbox'] },
  { role: 'engineer', email: 'engineer@larkspur.example', label: 'Process engineer', nav: ['Home'] },
  { role: 'technician', email: 'technician@larkspur.example', label: 'Line technician', nav: ['Home'] },
  { role: 'reviewer', email: 'reviewer@larkspur.example', label: 'QA reviewer', nav: ['Home'] },
] as const;

const e2e = appAndBrowserForThisFile(E2E_TIMEOUT);

describe('signing in as each demo role', () => {
  for (const demo of demoRoles) {
    it(`${demo.label} signs in with the demo sign-in and sees the navigation of the role (foundation: ${demo.nav.join(', ')})`, async () => {
      const { context, page } = await newPage(e2e.browser, e2e.app.url);
      try {
        // Arrange: no session yet, so Home sends the person to sign-in and remembers nothing else.
        await page.goto('/');
        await page.waitForURL(/\/sign-in/);

        if (demo.role === 'administrator') {
          await page.getByTestId('demo-sign-in-administrator').waitFor();
          await screenshot(page, 'sign-in');
          expect(await wcagViolations(page)).toEqual([]);
        }

        // Act: the demo sign-in for this role fills the form; the person presses Sign in.
        await page.getByTestId(`demo-sign-in-${demo.role}`).click();
        await expect.poll(() => page.getByLabel('E-mail').inputValue()).toBe(demo.email);
        await page.getByRole('button', { name: 'Sign in', exact: true }).click();
        await page.getByRole('navigation', { name: 'Main' }).waitFor();

        // Assert: exactly this role's navigation, the role named on Home and in the user menu.
        const shown = await navigationLabels(page);
        expect(shown.filter((label) => foundationLabels.includes(label))).toEqual([...demo.nav]);
        expect(shown).toEqual(navigationFor(demo.role).map((item) => item.label));
        expect(await page.getByTestId('home-role').innerText()).toBe(demo.label);
        expect(await page.getByTestId('user-menu-role').innerText()).toBe(demo.label);
        await screenshot(page, `${demo.role}-home`);
        expect(await wcagViolations(page)).toEqual([]);

        await signOut(page);
        await page.goto('/');
        await page.waitForURL(/\/sign-in/);
      } finally {
        await context.close();
      }
    }, E2E_TIMEOUT);
  }

  it('a Line technician who opens /admin/users by URL is told the page is not permitted for the role', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url);
    try {
      await signIn(page, 'technician@larkspur.example');
      await page.goto('/admin/users');
      await page.getByRole('heading', { name: /Not permitted for your role/ }).waitFor();
      expect(await page.getByText('Line technician role').count()).toBe(1);
      expect(await page.getByRole('table').count()).toBe(0);
      await screenshot(page, 'technician-not-permitted');
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);

  it('a wrong password keeps the person on the sign-in page with the server’s message', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url);
    try {
      await page.goto('/sign-in');
      await page.getByLabel('E-mail').fill('engineer@larkspur.example');
      await page.getByLabel('Password', { exact: true }).fill('not-the-password');
      await page.getByRole('button', { name: 'Sign in', exact: true }).click();
      const alert = page.getByRole('alert');
      await alert.waitFor();
      expect(await alert.innerText()).toContain('Could not sign in');
      expect(page.url()).toContain('/sign-in');
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);

  it('after sign-in the person returns to the page they asked for', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url);
    try {
      await page.goto('/admin/audit?actor=admin');
      await page.waitForURL(/\/sign-in\?next=/);
      await signIn(page, 'admin@larkspur.example');
      await page.waitForURL(/\/admin\/audit\?actor=admin$/);
      await page.getByRole('heading', { name: 'Audit trail', level: 1 }).waitFor();
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);

  it('is usable from the keyboard: skip link first, then the menu opens and closes with the keyboard', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url);
    try {
      await signIn(page, 'reviewer@larkspur.example');
      await page.locator('body').focus();
      await page.keyboard.press('Tab');
      const skip = page.getByRole('link', { name: 'Skip to main content' });
      expect(await skip.evaluate((element) => element === document.activeElement)).toBe(true);
      expect(await skip.isVisible()).toBe(true);
      const box = await skip.boundingBox();
      expect(box && box.width > 20 && box.height > 20).toBe(true);
      await screenshot(page, 'keyboard-skip-link');
      await page.keyboard.press('Enter');
      expect(await page.evaluate(() => document.activeElement?.id)).toBe('main');

      const toggle = page.getByTestId('user-menu-toggle');
      await toggle.focus();
      await page.keyboard.press('Enter');
      await page.getByRole('button', { name: 'Sign out' }).waitFor();
      await page.keyboard.press('Escape');
      await page.getByRole('button', { name: 'Sign out' }).waitFor({ state: 'hidden' });
      expect(await toggle.evaluate((element) => element === document.activeElement)).toBe(true);
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);

  it('an unknown address shows the not-found page', async () => {
    const { context, page } = await newPage(e2e.browser, e2e.app.url);
    try {
      await page.goto('/no/such/page');
      await page.getByRole('heading', { name: 'No page at this address' }).waitFor();
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);
});
