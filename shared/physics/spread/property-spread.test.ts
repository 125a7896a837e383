import { describe, expect, it } from 'vitest';
import { createSpreadPlan } from './create-spread-plan';
import { mergeSpreadChunks } from './merge-spread-chunks';
import { runPropertySpread } from './run-property-spread';
import { runSpreadChunk } from './run-spread-chunk';
import type { SpreadEvaluator, SpreadOptions } from './spread-types';
import { summarizeSpread } from './summarize-spread';

// Analytic answers and their sources: tests/fixtures/spread-sources.md.
// Φ(−1) = 0.158655, z₀.₉₅ = 1.644854, φ(z₀.₉₅) = 0.103136, φ(0) = 0.398942 — Abramowitz & Stegun
// (1964) Table 26.1. Statistical bounds are 5 standard errors at fixed seeds (deterministic).
const K = 5;
const identity: SpreadEvaluator = (s) => s.x;

function normalCase(samples: number, extra: Partial<SpreadOptions> = {}) {
  return {
    base: { x: 1.25, unused: 7 },
    properties: [{ name: 'x', relativeUncertainty: 0.2, distribution: 'normal' as const }],
    samples,
    seed: 20_240_117,
    ...extra,
  };
}

describe('runPropertySpread against analytic answers', () => {
  it('margin = x, x ~ N(1.25, 0.25): onset probability Φ(−1) and percentiles 1.25 ∓ 1.6449·0.25', () => {
    const n = 20_000;
    const result = runPropertySpread({ ...normalCase(n), evaluate: identity });
    const p = 0.158_655;
    expect(Math.abs(result.onsetProbability - p)).toBeLessThan(K * Math.sqrt((p * (1 - p)) / n));
    expect(result.onsetStandardError).toBeCloseTo(Math.sqrt((p * (1 - p)) / n), 3);
    expect(result.onsetInterval95[0]).toBeLessThan(result.onsetProbability);
    expect(result.onsetInterval95[1]).toBeGreaterThan(result.onsetProbability);
    expect(result.onsetInterval95[1] - result.onsetInterval95[0]).toBeCloseTo(2 * 1.96 * Math.sqrt((p * (1 - p)) / n), 3);
    const tailSe = Math.sqrt((0.05 * 0.95) / n) / (0.103_136 / 0.25);
    const medianSe = Math.sqrt(0.25 / n) / (0.398_942 / 0.25);
    expect(Math.abs(result.marginPercentiles.p5 - 0.838_787)).toBeLessThan(K * tailSe);
    expect(Math.abs(result.marginPercentiles.p50 - 1.25)).toBeLessThan(K * medianSe);
    expect(Math.abs(result.marginPercentiles.p95 - 1.661_213)).toBeLessThan(K * tailSe);
    expect(result.percentileMethod).toBe('exact');
    expect(result.validSamples).toBe(n);
    expect(result.progress).toBe(1);
  });

  it('margin = a·x scales the threshold: a = 2, x ~ N(0.625, 0.125) gives the same Φ(−1)', () => {
    const n = 10_000;
    const result = runPropertySpread({
      base: { x: 0.625 },
      properties: [{ name: 'x', relativeUncertainty: 0.2, distribution: 'normal' }],
      samples: n,
      seed: 77,
      evaluate: (s) => 2 * s.x,
    });
    const p = 0.158_655;
    expect(Math.abs(result.onsetProbability - p)).toBeLessThan(K * Math.sqrt((p * (1 - p)) / n));
  });

  it('margin = x, x ~ U(0.88, 1.32) (base 1.1 ± 20 % half-width): onset 0.12/0.44 and linear percentiles', () => {
    const n = 20_000;
    const result = runPropertySpread({
      base: { x: 1.1 },
      properties: [{ name: 'x', relativeUncertainty: 0.2, distribution: 'uniform' }],
      samples: n,
      seed: 5,
      evaluate: identity,
    });
    const p = 0.12 / 0.44;
    expect(Math.abs(result.onsetProbability - p)).toBeLessThan(K * Math.sqrt((p * (1 - p)) / n));
    const se = (q: number) => Math.sqrt((q * (1 - q)) / n) * 0.44;
    expect(Math.abs(result.marginPercentiles.p5 - 0.902)).toBeLessThan(K * se(0.05));
    expect(Math.abs(result.marginPercentiles.p50 - 1.1)).toBeLessThan(K * se(0.5));
    expect(Math.abs(result.marginPercentiles.p95 - 1.298)).toBeLessThan(K * se(0.95));
    expect(result.minimumMargin).toBeGreaterThanOrEqual(0.88);
    expect(result.maximumMargin).toBeLessThan(1.32);
  });

  it('ranks properties by influence: Spearman values from Pearson (1907) ρ_S = (6/π)·asin(ρ/2)', () => {
    // margin = 3 + x + y − w, independent normals σ = 0.1, 0.2, 0.05 →
    // ρ_S = 0.42015 (x), 0.86256 (y), −0.20880 (w).
    const n = 20_000;
    const result = runPropertySpread({
      base: { x: 1, y: 1, w: 1 },
      properties: [
        { name: 'x', relativeUncertainty: 0.1, distribution: 'normal' },
        { name: 'y', relativeUncertainty: 0.2, distribution: 'normal' },
        { name: 'w', relativeUncertainty: 0.05, distribution: 'normal' },
      ],
      samples: n,
      seed: 1907,
      evaluate: (s) => 3 + s.x + s.y - s.w,
    });
    expect(result.sensitivity.map((s) => s.name)).toEqual(['y', 'x', 'w']);
    const byName = Object.fromEntries(result.sensitivity.map((s) => [s.name, s]));
    const tol = K / Math.sqrt(n);
    expect(Math.abs(byName.x.rankCorrelation - 0.420_146)).toBeLessThan(tol);
    expect(Math.abs(byName.y.rankCorrelation - 0.862_556)).toBeLessThan(tol);
    expect(Math.abs(byName.w.rankCorrelation + 0.208_798)).toBeLessThan(tol);
    expect(byName.y.direction).toBe('raises');
    expect(byName.w.direction).toBe('lowers');
    expect(result.sensitivitySamples).toBe(n);
  });

  it('gives the one-at-a-time swing of a product exactly: margin = x·y, swing of x = 2u·y', () => {
    const result = runPropertySpread({
      base: { x: 2, y: 3 },
      properties: [
        { name: 'x', relativeUncertainty: 0.1, distribution: 'normal' },
        { name: 'y', relativeUncertainty: 0.3, distribution: 'uniform' },
      ],
      samples: 100,
      seed: 1,
      evaluate: (s) => s.x * s.y,
    });
    expect(result.swing.map((s) => s.name)).toEqual(['y', 'x']);
    expect(result.swing[0].swing).toBeCloseTo(2 * 0.3 * 3 * 2, 12);
    expect(result.swing[1].marginLow).toBeCloseTo(1.8 * 3, 12);
    expect(result.swing[1].marginHigh).toBeCloseTo(2.2 * 3, 12);
  });
});

describe('seeded reproducibility', () => {
  it('repeats exactly with the same seed and differs with another seed', () => {
    const a = runPropertySpread({ ...normalCase(3000), evaluate: identity });
    const b = runPropertySpread({ ...normalCase(3000), evaluate: identity });
    const c = runPropertySpread({ ...normalCase(3000, { seed: 20_240_118 }), evaluate: identity });
    expect(b).toEqual(a);
    expect(c.marginPercentiles.p50).not.toBe(a.marginPercentiles.p50);
    expect(c.onsetProbability).not.toBe(a.onsetProbability);
  });
});

describe('chunked runs', () => {
  it('merging pieces run in any order equals the one-shot run (exact percentiles)', () => {
    const plan = createSpreadPlan(normalCase(5500));
    const whole = runSpreadChunk(plan, { start: 0, count: 5500 }, identity);
    const pieces = [
      runSpreadChunk(plan, { start: 3000, count: 2500 }, identity),
      runSpreadChunk(plan, { start: 0, count: 2000 }, identity),
      runSpreadChunk(plan, { start: 2000, count: 1000 }, identity),
    ];
    const merged = mergeSpreadChunks(plan, pieces);
    expect(merged).toEqual(whole);
    expect(summarizeSpread(plan, merged)).toEqual(summarizeSpread(plan, whole));
  });

  it('merging equals one-shot in histogram mode too, and survives a JSON round trip (resume)', () => {
    const plan = createSpreadPlan(normalCase(4000, { exactPercentileLimit: 0 }));
    const whole = runSpreadChunk(plan, { start: 0, count: 4000 }, identity);
    let stored = JSON.parse(JSON.stringify(runSpreadChunk(plan, { start: 0, count: 1000 }, identity)));
    for (let start = 1000; start < 4000; start += 1000) {
      const piece = runSpreadChunk(plan, { start, count: 1000 }, identity);
      stored = JSON.parse(JSON.stringify(mergeSpreadChunks(plan, [stored, piece])));
    }
    expect(stored).toEqual(JSON.parse(JSON.stringify(whole)));
    const partial = summarizeSpread(plan, runSpreadChunk(plan, { start: 0, count: 2000 }, identity));
    expect(partial.progress).toBe(0.5);
  });

  it('histogram percentiles agree with exact percentiles of the same samples within 0.23 %', () => {
    const exact = runPropertySpread({ ...normalCase(20_000), evaluate: identity });
    const binned = runPropertySpread({ ...normalCase(20_000, { exactPercentileLimit: 0 }), evaluate: identity });
    expect(binned.percentileMethod).toBe('histogram');
    expect(binned.onsetProbability).toBe(exact.onsetProbability);
    for (const key of ['p5', 'p50', 'p95'] as const) {
      expect(Math.abs(binned.marginPercentiles[key] / exact.marginPercentiles[key] - 1)).toBeLessThan(
        binned.percentileRelativeResolution,
      );
    }
  });

  it('rejects a piece that does not start on a block boundary, or gaps between pieces', () => {
    const plan = createSpreadPlan(normalCase(5000));
    expect(() => runSpreadChunk(plan, { start: 500, count: 500 }, identity)).toThrow(/range.start must be a whole multiple of 1000/);
    expect(() => runSpreadChunk(plan, { start: 0, count: 1500 }, identity)).toThrow(/must end on a multiple of 1000/);
    expect(() => runSpreadChunk(plan, { start: 4000, count: 2000 }, identity)).toThrow(/range.count/);
    const a = runSpreadChunk(plan, { start: 0, count: 1000 }, identity);
    const c = runSpreadChunk(plan, { start: 2000, count: 1000 }, identity);
    expect(() => mergeSpreadChunks(plan, [a, c])).toThrow(/contiguous/);
  });
});

describe('margins that cannot be judged or have no drive', () => {
  it('leaves NaN samples out and counts them; keeps infinite margins (no drive) as the largest', () => {
    const result = runPropertySpread({
      ...normalCase(2000),
      evaluate: (s, i) => (i % 10 === 0 ? Number.NaN : i % 10 === 1 ? Number.POSITIVE_INFINITY : s.x),
    });
    expect(result.nonFiniteSamples).toBe(200);
    expect(result.validSamples).toBe(1800);
    expect(result.maximumMargin).toBe(Number.POSITIVE_INFINITY);
    expect(result.marginPercentiles.p95).toBe(Number.POSITIVE_INFINITY); // 200/1800 = 11 % are infinite
  });

  it('refuses to summarise a run where every sample failed', () => {
    expect(() => runPropertySpread({ ...normalCase(10), evaluate: () => Number.NaN })).toThrow(/no sample gave a margin/);
  });
});

describe('createSpreadPlan input checks', () => {
  const good = normalCase(100);
  it.each([
    [{ ...good, samples: 0 }, /samples must be a whole number from 1/],
    [{ ...good, seed: -4 }, /seed must be a whole number/],
    [{ ...good, properties: [] }, /at least one property/],
    [{ ...good, properties: [{ name: 'nope', relativeUncertainty: 0.1, distribution: 'normal' as const }] }, /"nope" has no value in base/],
    [{ ...good, properties: [{ name: 'x', relativeUncertainty: 0.6, distribution: 'normal' as const }] }, /relativeUncertainty \(x, normal 1σ\) must be from 0 to 0.5/],
    [{ ...good, properties: [{ name: 'x', relativeUncertainty: 1, distribution: 'uniform' as const }] }, /uniform half-width\) must be ≥ 0 and < 1/],
    [{ ...good, properties: [good.properties[0], good.properties[0]] }, /listed twice/],
    [{ ...good, base: { x: Number.NaN } }, /base.x must be a finite number/],
    [{ ...good, base: { x: 0 } }, /base.x is 0/],
  ])('rejects bad input %#', (options, message) => {
    expect(() => createSpreadPlan(options as SpreadOptions)).toThrow(message);
  });
});
