import { describe, expect, it } from 'vitest';
import { fitMarginSurrogate } from './fit-margin-surrogate';
import { runPropertySpread } from './run-property-spread';
import { solveLeastSquares } from './solve-least-squares';
import type { SpreadPropertySpec } from './spread-types';

describe('solveLeastSquares (Golub & Van Loan 2013 §5.3)', () => {
  it('recovers an exact line through consistent data: b = 1 + 2t', () => {
    const c = solveLeastSquares([[1, 0], [1, 1], [1, 2]], [1, 3, 5]);
    expect(c[0]).toBeCloseTo(1, 12);
    expect(c[1]).toBeCloseTo(2, 12);
  });

  it('gives the textbook least-squares line for (0,0), (1,1), (2,1): c = (1/6, 1/2) — hand-worked normal equations', () => {
    // AᵀA = [[3, 3], [3, 5]], Aᵀb = [2, 3] → c₁ = (3·3 − 3·2)/(15 − 9) = 0.5, c₀ = (2 − 1.5)/3 = 1/6.
    const c = solveLeastSquares([[1, 0], [1, 1], [1, 2]], [0, 1, 1]);
    expect(c[0]).toBeCloseTo(1 / 6, 12);
    expect(c[1]).toBeCloseTo(0.5, 12);
  });

  it('refuses a rank-deficient design, naming the column', () => {
    expect(() => solveLeastSquares([[1, 2], [2, 4], [3, 6]], [1, 2, 3])).toThrow(/column 1 of the design is dependent/);
    expect(() => solveLeastSquares([[1, 2, 3]], [1])).toThrow(/at least as many rows as columns/);
  });
});

describe('fitMarginSurrogate', () => {
  const props: SpreadPropertySpec[] = [
    { name: 'dSigmaDT', relativeUncertainty: 0.1, distribution: 'normal' },
    { name: 'viscosity', relativeUncertainty: 0.08, distribution: 'normal' },
    { name: 'conductivity', relativeUncertainty: 0.05, distribution: 'uniform' },
  ];
  const base = { dSigmaDT: -1e-4, viscosity: 5e-3, conductivity: 0.15, depth: 2e-4 };
  // A margin built like Ma_c/Ma: 80·μ·k/(|dσ/dT|·d·C) — a product of power laws, so ln M is linear
  // in the ln factors and the quadratic surface must reproduce it to rounding.
  const powerLaw = (s: Readonly<Record<string, number>>) =>
    (80 * s.viscosity * (s.conductivity / 2e6)) / (Math.abs(s.dSigmaDT) * s.depth * 1.5);

  it('reproduces a product of power laws to rounding, and says so in its validation', () => {
    const fit = fitMarginSurrogate({ base, properties: props, evaluateModes: (s) => [powerLaw(s)], seed: 3 });
    expect(fit.maxRelativeError).toBeLessThan(1e-10);
    expect(fit.onsetDisagreements).toBe(0);
    const sample = { ...base, viscosity: 5.3e-3, dSigmaDT: -0.93e-4 };
    expect(fit.evaluate(sample, 0) / powerLaw(sample)).toBeCloseTo(1, 10);
    expect(fit.designEvaluations).toBe(20); // 2 × (1 + 3 + 6) coefficients
  });

  it('gives the same spread as the full model for a power-law margin', () => {
    const common = { base, properties: props, samples: 5000, seed: 8 };
    const full = runPropertySpread({ ...common, evaluate: powerLaw });
    const fit = fitMarginSurrogate({ base, properties: props, evaluateModes: (s) => [powerLaw(s)], seed: 8 });
    const fast = runPropertySpread({ ...common, evaluate: fit.evaluate });
    expect(fast.onsetProbability).toBe(full.onsetProbability);
    expect(fast.marginPercentiles.p50).toBeCloseTo(full.marginPercentiles.p50, 9);
  });

  // Two smooth modes crossing inside the box: margin = min(μ/μ₀, 1.1·(k/k₀)^0.5).
  const modeA = (s: Readonly<Record<string, number>>) => s.viscosity / 5e-3;
  const modeB = (s: Readonly<Record<string, number>>) => 1.1 * Math.sqrt(s.conductivity / 0.15);

  it('reports a large validation error when a kink between two modes is fitted as one surface', () => {
    const fit = fitMarginSurrogate({
      base, properties: props, seed: 4, validationPoints: 200,
      evaluateModes: (s) => [Math.min(modeA(s), modeB(s))],
    });
    expect(fit.maxRelativeError).toBeGreaterThan(0.01);
  });

  it('is exact again when each mode is fitted on its own and the smallest is taken', () => {
    const fit = fitMarginSurrogate({
      base, properties: props, seed: 4, validationPoints: 200,
      // Like the stability solver: mode B (long-wave) is always known; mode A only where it wins.
      evaluateModes: (s) => [modeA(s) <= modeB(s) ? modeA(s) : Number.NaN, modeB(s)],
    });
    expect(fit.maxRelativeError).toBeLessThan(1e-9);
    expect(fit.onsetDisagreements).toBe(0);
  });

  it('rejects a margin that is not positive at a design point', () => {
    expect(() => fitMarginSurrogate({ base, properties: props, evaluateModes: () => [-1], seed: 1 })).toThrow(
      /needs a positive finite margin/,
    );
  });
});
