/**
 * Performance budget (issue 8): the JavaScript a first visit downloads — the entry script of
 * dist/client/index.html plus everything it imports statically, transitively — is at most 300 kB
 * gzip, and the plotting library is not part of it (it loads through a dynamic import when a page
 * draws a plot). Reads the real build output; `npm test` builds the client before the tests run.
 */
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { buildClientIfStale } from '../../scripts/lib/build-client';
import { clientDir, firstLoadGraph, gzipSizes } from './support/first-load-graph';

const BUDGET_BYTES = 300 * 1000;
/** A string only the plotting library's own code contains (its global style-rule element id). */
const PLOTLY_MARKER = 'plotly.js-style';

beforeAll(async () => {
  if (!existsSync(join(clientDir, 'index.html'))) await buildClientIfStale();
}, 300_000);

describe('first-load JavaScript budget', () => {
  it('finds the entry script and follows its static imports', () => {
    const graph = firstLoadGraph();
    expect(graph.size).toBeGreaterThanOrEqual(1);
    for (const file of graph) expect(existsSync(file), file).toBe(true);
  });

  it('is at most 300 kB gzip (entry + static imports)', () => {
    const graph = firstLoadGraph();
    const sizes = gzipSizes(graph);
    const total = sizes.reduce((sum, s) => sum + s.gzip, 0);
    expect(total, `first load: ${sizes.map((s) => `${s.file} ${(s.gzip / 1000).toFixed(1)} kB`).join(', ')}`).toBeLessThanOrEqual(BUDGET_BYTES);
  });

  it('keeps the plotting library out of the first load and reaches it only through a dynamic import', () => {
    const assets = join(clientDir, 'assets');
    const scripts = readdirSync(assets).filter((name) => name.endsWith('.js')).map((name) => join(assets, name));
    const plotly = scripts.filter((file) => readFileSync(file, 'utf8').includes(PLOTLY_MARKER));
    expect(plotly.length, 'the build contains the plotting library').toBeGreaterThan(0);
    const graph = firstLoadGraph();
    for (const file of plotly) {
      expect(graph.has(file), `${file} is in the first-load graph`).toBe(false);
      const name = file.slice(assets.length + 1);
      const importedDynamically = scripts.some((other) => new RegExp(`import\\(\\s*["'\`]\\./${name.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}["'\`]`).test(readFileSync(other, 'utf8')));
      expect(importedDynamically, `${name} is loaded with import()`).toBe(true);
    }
  });
});
