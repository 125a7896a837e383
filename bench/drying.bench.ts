/**
 * Drying path benchmark (standalone; run by `npm run bench` or `npm run bench -- drying`).
 * Prints the median time of one complete 3-zone Drying path (Larkspur Line 2 demo: integration,
 * 121-point plotting grid with both Onset margins, crossings, zone loads and cautions) against the
 * target in the design brief, ≤ 200 ms. Each run builds its critical-value tables afresh, so the
 * figure includes the stability solves. Exits 0 either way; a miss is printed as MISSED with the factor.
 */
import { cpus, loadavg } from 'node:os';
import { computeDryingPath, demoLine2DryingInput } from '../shared/physics/drying';

const TARGET_MS = 200;
const WARMUP = 3;
const REPEATS = 15;

function median(samples: number[]): number {
  const sorted = [...samples].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

const input = demoLine2DryingInput();
for (let i = 0; i < WARMUP; i++) computeDryingPath(input);
const samples: number[] = [];
let last = computeDryingPath(input);
for (let i = 0; i < REPEATS; i++) {
  const start = performance.now();
  last = computeDryingPath(input);
  samples.push(performance.now() - start);
}
const ms = median(samples);
const verdict = ms <= TARGET_MS ? 'ok' : `MISSED by ×${(ms / TARGET_MS).toFixed(2)}`;
console.log(`machine: ${cpus().length} cores, load average ${loadavg().map((x) => x.toFixed(2)).join(' ')}`);
console.log(
  `${'Drying path, 3 zones, 121-point grid (Line 2 demo)'.padEnd(58)} median ${ms.toFixed(1).padStart(8)} ms   target ≤ ${TARGET_MS} ms   ${verdict}`,
);
console.log(
  `  min ${Math.min(...samples).toFixed(1)} ms, max ${Math.max(...samples).toFixed(1)} ms over ${REPEATS} runs; ` +
    `${last.stats.accepted} accepted steps, ${last.stats.rejected} rejected, ${last.stats.evaluations} right-hand-side calls; ` +
    `mass-balance error ${last.massBalance.relativeError.toExponential(1)}; verdict ${last.onset.verdict}`,
);
