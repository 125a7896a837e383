/**
 * Property spread benchmark (standalone; run by `npm run bench` or `npm run bench -- spread`).
 * 1. A 10,000-sample spread of a realistic layer (solvent-borne coat, 200 µm, six uncertain
 *    properties) through the stability solver's Onset margin, via the validated response surface
 *    (its design and validation solves are included in the time) — target ≤ 3 s, median printed.
 * 2. The same spread's cost per sample with the full solver, projected to 10,000 samples.
 * 3. The engine alone: 1,000,000 samples of a cheap margin, in 50,000-sample chunks merged as a job
 *    queue would, with the rate reported.
 * Exits 0 either way: a miss is printed as MISSED with the factor.
 */
import { cpus, loadavg } from 'node:os';
import type { PhysicalLayer } from '../shared/physics/sizing/types';
import { createSpreadPlan } from '../shared/physics/spread/create-spread-plan';
import { mergeSpreadChunks } from '../shared/physics/spread/merge-spread-chunks';
import { runSpreadChunk } from '../shared/physics/spread/run-spread-chunk';
import { spreadLayerMargin } from '../shared/physics/spread/spread-layer-margin';
import type { SpreadChunk, SpreadPropertySpec } from '../shared/physics/spread/spread-types';
import { summarizeSpread } from '../shared/physics/spread/summarize-spread';

const TARGET_MS = 3000;
const REPEATS = 5;

function median(samples: number[]): number {
  const sorted = [...samples].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/** Invented demo layer: a 200 µm solvent-borne coat on a conducting plate, 1.5 K across it. */
const layer: PhysicalLayer = {
  density: 1000,
  viscosity: 0.005,
  conductivity: 0.15,
  heatCapacity: 2000,
  expansion: 1e-3,
  surfaceTension: 0.03,
  dSigmaDT: -1e-4,
  depth: 200e-6,
  deltaT: 1.5,
  heatTransfer: 20,
  gravity: 9.80665,
  bottom: 'rigid',
  bottomThermal: 'conducting',
  top: 'surface',
};
const uncertainties: SpreadPropertySpec[] = [
  { name: 'viscosity', relativeUncertainty: 0.1, distribution: 'normal' },
  { name: 'dSigmaDT', relativeUncertainty: 0.1, distribution: 'normal' },
  { name: 'conductivity', relativeUncertainty: 0.05, distribution: 'normal' },
  { name: 'heatCapacity', relativeUncertainty: 0.05, distribution: 'uniform' },
  { name: 'depth', relativeUncertainty: 0.05, distribution: 'normal' },
  { name: 'density', relativeUncertainty: 0.02, distribution: 'normal' },
];

console.log(`machine: ${cpus().length} cores, load average ${loadavg().map((x) => x.toFixed(2)).join(' ')}`);

// 1. 10,000 samples through the solver's margin (response surface, fit included).
const wall: number[] = [];
let last = spreadLayerMargin(layer, uncertainties, { samples: 10_000, seed: 1 });
for (let i = 0; i < REPEATS; i++) {
  const start = performance.now();
  last = spreadLayerMargin(layer, uncertainties, { samples: 10_000, seed: 1 + i });
  wall.push(performance.now() - start);
}
const ms = median(wall);
const verdict = ms <= TARGET_MS ? 'ok' : `MISSED by ×${(ms / TARGET_MS).toFixed(2)}`;
console.log(
  `${'Property spread, 10,000 samples, 6 properties'.padEnd(50)} median ${ms.toFixed(0).padStart(6)} ms   target ≤ ${TARGET_MS} ms   ${verdict}`,
);
console.log(
  `  evaluator ${last.method}` +
    (last.surrogate
      ? `: ${last.surrogate.designEvaluations} design + ${last.surrogate.validationEvaluations} validation solves, ` +
        `max validation error ${(last.surrogate.maxRelativeError * 100).toPrecision(2)} %`
      : '') +
    (last.fallbackReason ? ` (${last.fallbackReason})` : ''),
);
console.log(
  `  P(onset) ${last.onsetProbability.toFixed(4)} [${last.onsetInterval95.map((x) => x.toFixed(4)).join(', ')}], ` +
    `margin p5/p50/p95 ${[last.marginPercentiles.p5, last.marginPercentiles.p50, last.marginPercentiles.p95].map((x) => x.toFixed(3)).join(' / ')}, ` +
    `most influential ${last.sensitivity[0].name} (ρ_S ${last.sensitivity[0].rankCorrelation.toFixed(3)})`,
);

// 2. Full solver per sample, projected.
const solverSamples = 40;
const solverStart = performance.now();
spreadLayerMargin(layer, uncertainties, { samples: solverSamples, seed: 2, method: 'solver' });
const perSample = (performance.now() - solverStart) / (solverSamples + 2 * uncertainties.length);
console.log(
  `  full solver instead: ${perSample.toFixed(1)} ms per sample → about ${((perSample * 10_000) / 1000).toFixed(0)} s for 10,000 (not the default path)`,
);

// 3. The engine alone, chunked like a job queue.
const plan = createSpreadPlan({
  base: { x: 1.25, y: 1 },
  properties: [
    { name: 'x', relativeUncertainty: 0.2, distribution: 'normal' },
    { name: 'y', relativeUncertainty: 0.1, distribution: 'uniform' },
  ],
  samples: 1_000_000,
  seed: 7,
});
const engineStart = performance.now();
let merged: SpreadChunk | null = null;
for (let start = 0; start < plan.samples; start += 50_000) {
  const piece = runSpreadChunk(plan, { start, count: 50_000 }, (s) => s.x * s.y);
  merged = merged ? mergeSpreadChunks(plan, [merged, piece]) : piece;
}
const summary = summarizeSpread(plan, merged!);
const engineMs = performance.now() - engineStart;
console.log(
  `${'Spread engine, 1,000,000 samples in 20 chunks'.padEnd(50)} ${engineMs.toFixed(0).padStart(13)} ms   ` +
    `${((plan.samples / engineMs) * 1000).toFixed(0)} samples/s (cheap margin; histogram percentiles ±${(summary.percentileRelativeResolution * 100).toFixed(2)} %)`,
);
