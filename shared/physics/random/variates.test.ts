import { describe, expect, it } from 'vitest';
import { nextStandardNormal } from './next-standard-normal';
import { nextUniform } from './next-uniform';
import { seedXoshiro128State } from './seed-xoshiro128-state';

// Statistical checks use k = 5 standard errors for the sample size, at fixed seeds: the outcome is
// deterministic, and a correct generator would fail a 5σ bound with probability < 6e-7.
// Moments of U(0,1): mean 1/2, variance 1/12; of N(0,1): mean 0, variance 1, Var(s²) ≈ 2/n,
// Φ(−1.6449) = 0.05 — Abramowitz M., Stegun I. A. (1964) Handbook of Mathematical Functions,
// NBS AMS 55, Table 26.1 and §26.2.
const K = 5;
const N = 200_000;

function moments(values: Float64Array): { mean: number; variance: number } {
  let mean = 0;
  for (const v of values) mean += v;
  mean /= values.length;
  let ss = 0;
  for (const v of values) ss += (v - mean) ** 2;
  return { mean, variance: ss / (values.length - 1) };
}

describe('nextUniform', () => {
  it('stays in [0, 1) and has mean 1/2 and variance 1/12 within 5 standard errors', () => {
    const state = seedXoshiro128State(20_240_601);
    const values = new Float64Array(N);
    for (let i = 0; i < N; i += 1) values[i] = nextUniform(state);
    expect(values.every((v) => v >= 0 && v < 1)).toBe(true);
    const { mean, variance } = moments(values);
    expect(Math.abs(mean - 0.5)).toBeLessThan(K * Math.sqrt(1 / 12 / N));
    // Var(s²) for U(0,1) = (μ₄ − σ⁴)/n with μ₄ = 1/80, σ⁴ = 1/144.
    expect(Math.abs(variance - 1 / 12)).toBeLessThan(K * Math.sqrt((1 / 80 - 1 / 144) / N));
  });

  it('is reproducible for a seed', () => {
    const a = seedXoshiro128State(5);
    const b = seedXoshiro128State(5);
    for (let i = 0; i < 100; i += 1) expect(nextUniform(a)).toBe(nextUniform(b));
  });
});

describe('nextStandardNormal', () => {
  it('has mean 0, variance 1 and a 5 % lower tail below −1.6449, within 5 standard errors', () => {
    const state = seedXoshiro128State(1_958);
    const values = new Float64Array(N);
    for (let i = 0; i < N; i += 1) values[i] = nextStandardNormal(state);
    const { mean, variance } = moments(values);
    expect(Math.abs(mean)).toBeLessThan(K * Math.sqrt(1 / N));
    expect(Math.abs(variance - 1)).toBeLessThan(K * Math.sqrt(2 / N));
    const tail = values.filter((v) => v < -1.6449).length / N;
    expect(Math.abs(tail - 0.05)).toBeLessThan(K * Math.sqrt((0.05 * 0.95) / N));
    expect(values.every(Number.isFinite)).toBe(true);
  });

  it('is reproducible for a seed and differs between seeds', () => {
    const draw = (seed: number) => {
      const state = seedXoshiro128State(seed);
      return Array.from({ length: 20 }, () => nextStandardNormal(state));
    };
    expect(draw(9)).toEqual(draw(9));
    expect(draw(9)).not.toEqual(draw(10));
  });
});
