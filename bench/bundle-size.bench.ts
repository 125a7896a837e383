/**
 * Bundle benchmark (`npm run bench -- bundle`): first-load JavaScript of dist/client (entry plus its
 * static imports) in gzip kB against the 300 kB budget of issue 8, and the size of every lazily
 * loaded chunk over 20 kB gzip (the plotting library among them). Builds the client when stale.
 * Exits 0 either way; a miss is printed as MISSED.
 */
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { buildClientIfStale } from '../scripts/lib/build-client';
import { clientDir, firstLoadGraph, gzipSizes } from '../tests/hardening/support/first-load-graph';

const BUDGET_KB = 300;

async function main(): Promise<void> {
  await buildClientIfStale();
  const graph = firstLoadGraph();
  const first = gzipSizes(graph);
  const total = first.reduce((sum, s) => sum + s.gzip, 0) / 1000;
  for (const s of first) console.log(`  first load  ${s.file.padEnd(48)} ${(s.gzip / 1000).toFixed(1).padStart(8)} kB gzip`);
  console.log(`first-load JavaScript: ${total.toFixed(1)} kB gzip (budget ≤ ${BUDGET_KB} kB) ${total <= BUDGET_KB ? 'ok' : `MISSED ×${(total / BUDGET_KB).toFixed(2)}`}`);
  const assets = join(clientDir, 'assets');
  const lazy = gzipSizes(readdirSync(assets).filter((n) => n.endsWith('.js')).map((n) => join(assets, n)).filter((f) => !graph.has(f)));
  for (const s of lazy.filter((l) => l.gzip > 20_000).sort((a, b) => b.gzip - a.gzip)) {
    console.log(`  lazy        ${s.file.padEnd(48)} ${(s.gzip / 1000).toFixed(1).padStart(8)} kB gzip`);
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
