import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import refs from '../../../tests/fixtures/stability-references.json';
import { onsetMargin } from './onset-margin';
import { onsetMarginSweep } from './onset-margin-sweep';
import type { OnsetResult, StabilityProblem } from './types';

// Warm-started searches (onsetMarginSweep, onsetMargin with wavenumberHint) against the cold search of
// onsetMargin on the same problems. The warm start may only change the cost: its margin must never be larger
// than the cold one beyond the solver's tolerance (λ to about 1e-7 relative; 1e-6 allowed here).
const TOLERANCE = 1e-6;
const notWorse = (warm: number, cold: number) => warm === cold || warm <= cold * (1 + TOLERANCE);
const agrees = (warm: number, cold: number) =>
  warm === cold || (Number.isFinite(warm) && Number.isFinite(cold) && Math.abs(warm - cold) <= TOLERANCE * Math.max(warm, cold));

const boundaries = fc.record({
  bottom: fc.constantFrom('rigid' as const, 'free' as const),
  bottomThermal: fc.constantFrom('conducting' as const, 'insulating' as const),
  top: fc.constantFrom('rigid' as const, 'free' as const, 'surface' as const, 'surface' as const),
});

/**
 * A depth sweep as a Quiet window makes it: dimensionless groups at a reference depth, then
 * Ra ∝ d³, Ma ∝ d, Bi ∝ d, Cr ∝ 1/d, Bo ∝ d² over a log-spaced range (the scalings follow from the
 * definitions Ra = gβΔTd³/(νκ), Ma = σ_TΔTd/(μκ), Bi = hd/λ, Cr = μκ/(σd), Bo = ρgd²/σ).
 */
const depthSweep = fc
  .record({
    layer: boundaries,
    rayleigh: fc.double({ min: 1, max: 3000, noNaN: true }),
    marangoni: fc.double({ min: -50, max: 300, noNaN: true }),
    biot: fc.double({ min: 0, max: 2, noNaN: true }),
    crispation: fc.double({ min: 1e-7, max: 1e-2, noNaN: true }),
    bond: fc.double({ min: 0.01, max: 3, noNaN: true }),
    deformable: fc.boolean(),
    span: fc.double({ min: 2, max: 300, noNaN: true }),
    count: fc.integer({ min: 8, max: 24 }),
  })
  .map((s): StabilityProblem[] =>
    Array.from({ length: s.count }, (_, i) => {
      const scale = s.span ** (i / (s.count - 1) - 0.5);
      const surface = s.layer.top === 'surface';
      const problem: StabilityProblem = {
        ...s.layer,
        biot: s.biot * scale,
        rayleigh: s.rayleigh * scale ** 3,
        marangoni: s.marangoni * scale,
      };
      return surface && s.deformable ? { ...problem, crispation: s.crispation / scale, bond: s.bond * scale * scale } : problem;
    }),
  );

function expectSameAsCold(warm: OnsetResult, cold: OnsetResult): void {
  expect(notWorse(warm.margin, cold.margin)).toBe(true);
  expect(notWorse(warm.cellMargin, cold.cellMargin)).toBe(true);
  expect(agrees(warm.longWaveMargin, cold.longWaveMargin)).toBe(true);
}

describe('onsetMarginSweep', () => {
  it('is never worse than the cold search on random depth sweeps (flat and deformable surfaces)', () => {
    fc.assert(
      fc.property(depthSweep, (problems) => {
        const warm = onsetMarginSweep(problems);
        expect(warm).toHaveLength(problems.length);
        problems.forEach((problem, i) => expectSameAsCold(warm[i], onsetMargin(problem)));
      }),
      { numRuns: 40, seed: 20261202 },
    );
  });

  it('also when neighbours are far apart (shuffled order): a failed bracket falls back to the full scan', () => {
    fc.assert(
      fc.property(depthSweep, fc.integer({ min: 1, max: 7 }), (problems, stride) => {
        const shuffled = problems.map((_, i) => problems[(i * stride * 3 + i) % problems.length]);
        const warm = onsetMarginSweep(shuffled);
        shuffled.forEach((problem, i) => expectSameAsCold(warm[i], onsetMargin(problem)));
      }),
      { numRuns: 15, seed: 99 },
    );
  });

  it(`keeps the published onsets along a sweep: Ma alone on Pearson's layer gives 79.607/Ma at k_c = 1.993 (${refs.pearson.source})`, () => {
    const marangonis = [10, 20, 40, 60, 79.607, 100, 160];
    const results = onsetMarginSweep(marangonis.map((marangoni) => ({ bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', biot: 0, rayleigh: 0, marangoni })));
    results.forEach((r, i) => {
      expect(Math.abs(r.margin * marangonis[i] - refs.pearson.marangoni)).toBeLessThan(0.0005);
      expect(Math.abs(r.criticalWavenumber - refs.pearson.wavenumber)).toBeLessThan(1e-3);
    });
  });

  it(`follows Ra_c = 1707.762 at k_c = 3.117 when the drive changes along the sweep (Chandrasekhar 1961, ch. II)`, () => {
    const rayleighs = [500, 1000, 1707.762, 3000, 6000];
    const results = onsetMarginSweep(rayleighs.map((rayleigh) => ({ bottom: 'rigid', bottomThermal: 'conducting', top: 'rigid', biot: Infinity, rayleigh, marangoni: 0 })));
    results.forEach((r, i) => {
      expect(Math.abs(r.margin * rayleighs[i] - 1707.762) / 1707.762).toBeLessThan(1e-5);
      expect(Math.abs(r.criticalWavenumber - 3.117)).toBeLessThan(1e-3);
    });
  });

  it('returns an empty list for no problems and rejects a bad problem naming its index and field', () => {
    expect(onsetMarginSweep([])).toEqual([]);
    const good: StabilityProblem = { bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', biot: 0, rayleigh: 100, marangoni: 10 };
    expect(() => onsetMarginSweep([good, { ...good, marangoni: Number.NaN }])).toThrow(/problems\[1\].*marangoni/);
    expect(() => onsetMarginSweep(null as unknown as StabilityProblem[])).toThrow(RangeError);
  });
});

describe('onsetMargin with a wavenumberHint', () => {
  const problem = fc
    .tuple(boundaries, fc.double({ min: -3000, max: 3000, noNaN: true }), fc.double({ min: -300, max: 300, noNaN: true }), fc.double({ min: 0, max: 20, noNaN: true }))
    .map(([b, rayleigh, marangoni, biot]): StabilityProblem => ({ ...b, biot, rayleigh, marangoni }));

  it('is never worse than the cold search, whatever the hint (0.02 to 50 per depth)', () => {
    fc.assert(
      fc.property(problem, fc.double({ min: 0.02, max: 50, noNaN: true }), (p, hint) => {
        expectSameAsCold(onsetMargin(p, { wavenumberHint: hint }), onsetMargin(p));
      }),
      { numRuns: 60, seed: 5 },
    );
  });

  it('rejects a hint that is not a finite number > 0, naming wavenumberHint', () => {
    const p: StabilityProblem = { bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', biot: 0, rayleigh: 100, marangoni: 10 };
    for (const hint of [0, -1, Number.NaN, Infinity]) expect(() => onsetMargin(p, { wavenumberHint: hint })).toThrow(/wavenumberHint/);
    expect(() => onsetMargin(p, { wavenumberHint: '2' as unknown as number })).toThrow(RangeError);
  });
});
