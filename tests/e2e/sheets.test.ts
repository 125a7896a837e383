/**
 * Process sheets end to end (issue 5): a process engineer issues a sheet from a layer check and
 * submits it; a QA reviewer signs it with password re-entry and a meaning; the signed PDF is
 * rendered to PNG (pdftoppm) into test-output/screenshots/sheet-page1.png for a person to look at;
 * the verify page recognises the signed PDF. Demo people: scripts/lib/seed/demo-users.ts.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { projectRoot } from '../../scripts/lib/project-root';
import { wcagViolations } from './support/accessibility';
import { newPage, screenshot, screenshotDir, signIn, DEMO_PASSWORD } from './support/browser';
import { appAndBrowserForThisFile } from './support/app-and-browser';

const E2E_TIMEOUT = 180_000;
const e2e = appAndBrowserForThisFile(E2E_TIMEOUT);

describe('process sheet from issue to signature', () => {
  it(
    'engineer submits, reviewer signs, the signed PDF renders and verifies',
    async () => {
      // Arrange: the engineer saves a layer check on the demo primer (Line 2, invented data).
      const engineer = await newPage(e2e.browser, e2e.app.url);
      await signIn(engineer.page, 'engineer@larkspur.example');
      const fluids = await engineer.context.request.get('/api/fluids', { params: { q: 'Primer', pageSize: 10 } });
      const primer = (await fluids.json()).items[0];
      expect(primer?.name).toContain('Primer');
      const saved = await engineer.context.request.post('/api/layer-checks', {
        data: {
          title: 'Line 2 primer, oven zone 1',
          fluidId: primer.id,
          processKind: 'drying-coat',
          temperature: '35 °C',
          depth: '60 µm',
          bottom: { mechanics: 'rigid', thermal: 'conducting' },
          top: 'surface',
          deformableSurface: true,
          heating: { mode: 'substrate-air', substrateTemperature: '45 °C', airTemperature: '30 °C', heatTransferCoefficient: '25 W/(m²·K)' },
        },
      });
      expect(saved.status()).toBe(201);
      const check = await saved.json();

      // Act 1: the engineer issues the sheet from the check and submits it.
      await engineer.page.goto(`/sheets?new=1&checkId=${check.id}`);
      const form = engineer.page.getByRole('form', { name: 'New process sheet' });
      await form.getByLabel('Layer check').selectOption(check.id);
      await form.getByLabel('Line', { exact: true }).fill('Line 2');
      await form.getByLabel('Purpose').fill('Release the primer at 60 µm wet through oven zone 1.');
      await form.getByRole('button', { name: 'Make draft sheet' }).click();
      await engineer.page.waitForURL(/\/sheets\/[0-9a-f-]{36}$/);
      const sheetUrl = new URL(engineer.page.url()).pathname;
      const sheetId = sheetUrl.split('/').pop() as string;
      const heading = engineer.page.getByRole('heading', { level: 1, name: /LC-PS-\d{4} revision 1/ });
      await heading.waitFor();
      const number = /LC-PS-\d{4}/.exec(await heading.innerText())?.[0] as string;
      await engineer.page.getByRole('button', { name: 'Submit for review' }).click();
      await engineer.page.getByRole('button', { name: 'Submit for review' }).waitFor({ state: 'detached' });
      await engineer.page.getByText('Waiting for a QA reviewer.').waitFor();
      await screenshot(engineer.page, 'sheet-awaiting-review');
      // WCAG 2.1 AA (axe-core) on the sheet page and the list.
      expect(await wcagViolations(engineer.page)).toEqual([]);
      await engineer.page.goto('/sheets');
      await engineer.page.getByRole('link', { name: `${number} rev. 1`, exact: true }).waitFor();
      expect(await wcagViolations(engineer.page)).toEqual([]);
      await screenshot(engineer.page, 'sheets-list');
      await engineer.context.close();

      // Act 2: the reviewer opens it and signs with password and meaning.
      const reviewer = await newPage(e2e.browser, e2e.app.url);
      await signIn(reviewer.page, 'reviewer@larkspur.example');
      await reviewer.page.goto(sheetUrl);
      await reviewer.page.getByRole('button', { name: 'Sign…' }).click();
      const dialog = reviewer.page.getByRole('dialog');
      await dialog.getByLabel(/Approved for production/).check();
      expect(await wcagViolations(reviewer.page)).toEqual([]);
      await dialog.getByLabel('Your password').fill('not the password');
      await dialog.getByRole('button', { name: 'Sign sheet' }).click();
      await dialog.getByText('The password is not right.').waitFor();
      await dialog.getByLabel('Your password').fill(DEMO_PASSWORD);
      await dialog.getByRole('button', { name: 'Sign sheet' }).click();
      const signature = reviewer.page.getByRole('definition').filter({ hasText: 'Hannah Okafor' });
      await signature.first().waitFor();
      await reviewer.page.getByRole('heading', { name: 'PDF as signed' }).waitFor();
      await screenshot(reviewer.page, 'sheet-signed');

      // Assert: the signed PDF, rendered to PNG for people to look at.
      const pdfResponse = await reviewer.context.request.get(`/api/sheets/${sheetId}/pdf`);
      expect(pdfResponse.headers()['content-type']).toBe('application/pdf');
      const pdf = Buffer.from(await pdfResponse.body());
      const outDir = join(projectRoot, 'test-output');
      mkdirSync(screenshotDir, { recursive: true });
      const pdfPath = join(outDir, 'sheet-signed.pdf');
      writeFileSync(pdfPath, pdf);
      const text = execFileSync('pdftotext', ['-layout', pdfPath, '-'], { encoding: 'utf8' });
      expect(text).toContain('State: Signed');
      expect(text).toContain('Hannah Okafor (QA reviewer)');
      expect(text).toContain('Approved for production');
      // No page is left nearly empty by a section broken across it: every page but the last holds at
      // least ten lines of its own besides the two footer lines (pdftotext ends each page with \f).
      const pages = text.split('\f').filter((page) => page.trim() !== '');
      for (const page of pages.slice(0, -1)) {
        expect(page.split('\n').filter((line) => line.trim() !== '').length - 2).toBeGreaterThanOrEqual(10);
      }
      execFileSync('pdftoppm', ['-png', '-r', '90', '-f', '1', '-l', '1', '-singlefile', pdfPath, join(screenshotDir, 'sheet-page1')]);
      expect(existsSync(join(screenshotDir, 'sheet-page1.png'))).toBe(true);
      expect(statSync(join(screenshotDir, 'sheet-page1.png')).size).toBeGreaterThan(20_000);
      execFileSync('pdftoppm', ['-png', '-r', '90', '-f', '2', '-l', '2', '-singlefile', pdfPath, join(screenshotDir, 'sheet-page2')]);

      // Assert: anyone signed in can verify the PDF on the verify page.
      await reviewer.page.goto('/verify');
      await reviewer.page.getByLabel('Process sheet PDF').setInputFiles(pdfPath);
      await reviewer.page.getByRole('button', { name: 'Verify' }).click();
      await reviewer.page.getByText(`This is the signed PDF of ${number} revision 1`).waitFor();
      await screenshot(reviewer.page, 'sheet-verify');
      expect(await wcagViolations(reviewer.page)).toEqual([]);
      await reviewer.context.close();
    },
    E2E_TIMEOUT,
  );
});
