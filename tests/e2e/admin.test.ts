/**
 * The administrator's pages in a real browser against the real server and PostgreSQL
 * (issue 2 "Foundation", deliver 6, 7 and 11): the users table and invite form with the same
 * schema as the server and its field errors beside the fields, the last-administrator rule shown
 * in the row, the outbox with the invitation mail delivered to the local SMTP fake, the
 * invitation link setting a password (policy: at least 12 characters, issue 2 "Bad input"),
 * and the audit trail with its filters and before/after snapshots.
 */
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { wcagViolations } from './support/accessibility';
import { navigationLabels, newPage, screenshot, signIn } from './support/browser';
import { appAndBrowserForThisFile } from './support/app-and-browser';

const E2E_TIMEOUT = 120_000;
const INVITEE = { email: 'rosa.marchetti@larkspur.example', name: 'Rosa Marchetti', role: 'Line technician' };

const e2e = appAndBrowserForThisFile(E2E_TIMEOUT);
let admin: { context: BrowserContext; page: Page };
let invitationLink = '';

beforeAll(async () => {
  admin = await newPage(e2e.browser, e2e.app.url);
  await signIn(admin.page, 'admin@larkspur.example');
}, E2E_TIMEOUT);

// Runs before the shared hook closes the browser (after-hooks run in reverse order).
afterAll(async () => {
  await admin?.context.close();
}, E2E_TIMEOUT);

function inviteForm(page: Page) {
  return page.getByRole('form', { name: 'Invite someone' });
}

describe('administrator pages', () => {
  it('lists the four demo users with their roles', async () => {
    const { page } = admin;
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Users' }).click();
    await page.getByRole('table').waitFor();
    for (const email of ['admin@larkspur.example', 'engineer@larkspur.example', 'technician@larkspur.example', 'reviewer@larkspur.example']) {
      expect(await page.getByRole('row').filter({ hasText: email }).count()).toBe(1);
    }
    const engineerRole = page.getByRole('combobox', { name: /Role of Priya Natarajan/ });
    expect(await engineerRole.inputValue()).toBe('engineer');
    await screenshot(page, 'administrator-users');
    expect(await wcagViolations(page)).toEqual([]);
  }, E2E_TIMEOUT);

  it('shows a malformed e-mail beside the E-mail field without sending anything', async () => {
    const form = inviteForm(admin.page);
    await form.getByLabel('E-mail').fill('not-an-address');
    await form.getByLabel('Name').fill('Someone');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await form.getByText('email must be a valid e-mail address').waitFor();
    expect(await form.getByLabel('E-mail').getAttribute('aria-invalid')).toBe('true');
  }, E2E_TIMEOUT);

  it('shows the server’s conflict for an existing account beside the E-mail field', async () => {
    const form = inviteForm(admin.page);
    await form.getByLabel('E-mail').fill('engineer@larkspur.example');
    await form.getByLabel('Name').fill('Second Priya');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await form.getByText('An account with this e-mail address already exists.').waitFor();
  }, E2E_TIMEOUT);

  it('invites a new Line technician', async () => {
    const form = inviteForm(admin.page);
    await form.getByLabel('E-mail').fill(INVITEE.email);
    await form.getByLabel('Name').fill(INVITEE.name);
    await form.getByLabel('Role').selectOption({ label: INVITEE.role });
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await form.getByText('Invitation sent').waitFor();
    expect(await form.getByLabel('E-mail').inputValue()).toBe('');
  }, E2E_TIMEOUT);

  it('refuses to remove the last administrator and says so in that row', async () => {
    const { page } = admin;
    const ownRole = page.getByRole('combobox', { name: /Role of Avery Lin/ });
    await ownRole.selectOption('engineer');
    await page.getByText('Not changed: Avery Lin (Administrator)').waitFor();
    await page.getByText('QuietLayer needs at least one active administrator').waitFor();
    expect(await ownRole.inputValue()).toBe('administrator');
    // The person's own row offers no deactivation.
    expect(await page.getByRole('button', { name: 'Deactivate Avery Lin (Administrator)' }).count()).toBe(0);
  }, E2E_TIMEOUT);

  it('deactivates and reactivates another account after a confirmation', async () => {
    const { page } = admin;
    const row = page.getByRole('row').filter({ hasText: 'reviewer@larkspur.example' });
    await row.getByRole('button', { name: /Deactivate/ }).click();
    await row.getByRole('button', { name: 'Confirm deactivate' }).click();
    await row.getByText('Deactivated').waitFor();
    await row.getByRole('button', { name: 'Reactivate' }).click();
    await row.getByRole('button', { name: /Deactivate/ }).waitFor();
    expect(await row.innerText()).toMatch(/\bActive\b/);
  }, E2E_TIMEOUT);

  it('shows the invitation in the outbox, delivered to the local mail catcher, with its link', async () => {
    const { page } = admin;
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Outbox' }).click();
    const row = page.getByRole('row').filter({ hasText: INVITEE.email });
    await row.waitFor();
    // The dispatcher sends within a second or two; refresh until the fake has it.
    await expect
      .poll(
        async () => {
          await page.getByRole('button', { name: 'Refresh' }).click();
          return row.innerText();
        },
        { timeout: 30_000, interval: 1_000 },
      )
      .toMatch(/Sent[\s\S]*Yes/);
    await row.getByRole('button', { name: /Show text/ }).click();
    const body = await page.locator('pre').filter({ hasText: INVITEE.name }).innerText();
    const match = body.match(/https?:\/\/\S+\/accept-invitation\?token=\S+/);
    expect(match, body).not.toBeNull();
    invitationLink = match![0];
    await screenshot(page, 'administrator-outbox');
    expect(await wcagViolations(page)).toEqual([]);
  }, E2E_TIMEOUT);

  it('lets the invited person set a password (≥ 12 characters) and sign in as their role', async () => {
    expect(invitationLink).not.toBe('');
    const { context, page } = await newPage(e2e.browser, e2e.app.url);
    try {
      await page.goto(invitationLink);
      await page.getByText(INVITEE.name).waitFor();
      await page.getByText(INVITEE.role, { exact: true }).waitFor();
      await page.getByLabel('New password', { exact: true }).fill('short-pass1');
      await page.getByLabel('Repeat the password').fill('short-pass1');
      await page.getByRole('button', { name: 'Set password and sign in' }).click();
      await page.getByText('password must be at least 12 characters').waitFor();

      await page.getByLabel('New password', { exact: true }).fill('casting drum at 80 degrees');
      await page.getByLabel('Repeat the password').fill('casting drum at 80 degrees');
      await page.getByRole('button', { name: 'Set password and sign in' }).click();
      await page.getByRole('navigation', { name: 'Main' }).waitFor();
      const shown = await navigationLabels(page);
      expect(shown).toContain('Home');
      for (const adminOnly of ['Users', 'Audit trail', 'Outbox']) expect(shown).not.toContain(adminOnly);
      expect(await page.getByTestId('home-role').innerText()).toBe(INVITEE.role);
    } finally {
      await context.close();
    }
  }, E2E_TIMEOUT);

  it('resets a forgotten password through the e-mailed link, once', async () => {
    const person = await newPage(e2e.browser, e2e.app.url);
    try {
      // The person asks for a link; the answer never says whether the address exists.
      await person.page.goto('/sign-in');
      await person.page.getByRole('link', { name: 'Forgot your password?' }).click();
      await person.page.getByLabel('E-mail').fill('engineer@larkspur.example');
      await person.page.getByRole('button', { name: 'Send reset link' }).click();
      await person.page.getByText('Check your mail').waitFor();

      // The administrator finds the mail in the outbox.
      const { page } = admin;
      await page.goto('/admin/outbox');
      const row = page.getByRole('row').filter({ hasText: 'Set a new QuietLayer password' });
      await expect
        .poll(
          async () => {
            await page.getByRole('button', { name: 'Refresh' }).click();
            return (await row.count()) === 1 && /Sent[\s\S]*Yes/.test(await row.innerText());
          },
          { timeout: 30_000, interval: 1_000 },
        )
        .toBe(true);
      await row.getByRole('button', { name: /Show text/ }).click();
      const body = await page.locator('pre').filter({ hasText: 'reset-password' }).innerText();
      const link = body.match(/https?:\/\/\S+\/reset-password\?token=\S+/)?.[0];
      expect(link, body).toBeDefined();

      // A mismatch is caught beside the second field; then the new password is set.
      await person.page.goto(link!);
      await person.page.getByLabel('New password', { exact: true }).fill('oven zone three at 140 C');
      await person.page.getByLabel('Repeat the password').fill('oven zone three at 141 C');
      await person.page.getByRole('button', { name: 'Set new password' }).click();
      await person.page.getByText('The two passwords are not the same').waitFor();
      await person.page.getByLabel('Repeat the password').fill('oven zone three at 140 C');
      await person.page.getByRole('button', { name: 'Set new password' }).click();
      await person.page.getByText('Password changed').waitFor();

      // The same link does not work twice.
      await person.page.goto(link!);
      await person.page.getByLabel('New password', { exact: true }).fill('a different sentence here');
      await person.page.getByLabel('Repeat the password').fill('a different sentence here');
      await person.page.getByRole('button', { name: 'Set new password' }).click();
      await person.page.getByText('This reset link no longer works').waitFor();

      await person.page.goto('/sign-in');
      await signIn(person.page, 'engineer@larkspur.example', 'oven zone three at 140 C');
      expect(await person.page.getByTestId('home-role').innerText()).toBe('Process engineer');
    } finally {
      await person.context.close();
    }
  }, E2E_TIMEOUT);

  it('shows the audit trail, filters it, and opens an event’s before and after', async () => {
    const { page } = admin;
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Audit trail' }).click();
    await page.getByRole('table').waitFor();
    expect(await page.getByRole('row').count()).toBeGreaterThan(1);

    const filters = page.getByRole('search', { name: 'Filter the audit trail' });
    await filters.getByLabel('From (date)').fill('2030-01-02');
    await filters.getByLabel('To (date)').fill('2030-01-01');
    await filters.getByRole('button', { name: 'Apply' }).click();
    await filters.getByText('to must be on or after from').waitFor();

    await filters.getByLabel('From (date)').fill('');
    await filters.getByLabel('To (date)').fill('');
    await filters.getByLabel('Actor e-mail contains').fill('admin@larkspur');
    await filters.getByRole('button', { name: 'Apply' }).click();
    await page.waitForURL(/actor=admin%40larkspur/);
    const rows = page.getByRole('row').filter({ hasText: 'admin@larkspur.example' });
    await rows.first().waitFor();

    await page.getByRole('button', { name: /Show details of event/ }).first().click();
    await page.getByRole('heading', { name: 'Before' }).waitFor();
    await page.getByRole('heading', { name: 'After' }).waitFor();
    await screenshot(page, 'administrator-audit');

    expect(await wcagViolations(page)).toEqual([]);

    await filters.getByLabel('Actor e-mail contains').fill('nobody-by-this-name');
    await filters.getByRole('button', { name: 'Apply' }).click();
    await page.getByText('No events match these filters').waitFor();
  }, E2E_TIMEOUT);
});
