/**
 * WCAG 2.1 A and AA checks with axe-core (Deque Systems, axe-core rules; W3C 2018, "Web Content
 * Accessibility Guidelines (WCAG) 2.1", success criteria 1.4.3 contrast, 4.1.2 name/role/value, …).
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';

const require = createRequire(import.meta.url);
// Evaluated through the DevTools protocol: the app's Content-Security-Policy (script-src 'self')
// rightly refuses an injected <script>, and the test must not weaken it.
const axeSource = readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');

export interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  targets: string[];
}

/** Runs axe-core in the page and returns the WCAG 2.x A/AA violations, one line per rule. */
export async function wcagViolations(page: Page): Promise<AxeViolation[]> {
  await page.evaluate(axeSource);
  await page.evaluate(() => document.fonts.ready);
  return page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (context: Document, options: object) => Promise<{ violations: Array<{ id: string; impact: string | null; help: string; nodes: Array<{ target: string[] }> }> }> } }).axe;
    const result = await axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'] } });
    return result.violations.map((violation) => ({
      id: violation.id,
      impact: violation.impact,
      help: violation.help,
      targets: violation.nodes.map((node) => node.target.join(' ')),
    }));
  });
}
