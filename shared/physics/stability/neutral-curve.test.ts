import { describe, expect, it } from 'vitest';
import { neutralCurve } from './neutral-curve';

/** Neutral Ra(k) = (π² + k²)³/k² for free/free conducting walls (Rayleigh 1916; Chandrasekhar 1961 §15). */
const freeFreeRayleigh = (k: number) => (Math.PI ** 2 + k * k) ** 3 / (k * k);

describe('neutralCurve', () => {
  const problem = { bottom: 'free', bottomThermal: 'conducting', top: 'free', biot: Infinity, rayleigh: 200, marangoni: 0 } as const;

  it('samples evenly from wavenumberMin to wavenumberMax and matches the free/free closed form (Chandrasekhar 1961)', () => {
    const curve = neutralCurve(problem, { wavenumberMin: 1, wavenumberMax: 5, points: 9 });
    expect(curve.wavenumber).toHaveLength(9);
    expect(curve.wavenumber[0]).toBe(1);
    expect(curve.wavenumber[8]).toBe(5);
    curve.wavenumber.forEach((k, i) => {
      expect(Math.abs(curve.rayleigh[i] - freeFreeRayleigh(k)) / freeFreeRayleigh(k)).toBeLessThan(1e-7);
      expect(curve.rayleigh[i]).toBeCloseTo(curve.factor[i] * 200, 6);
      expect(curve.marangoni[i]).toBe(0);
    });
  });

  it('uses 80 points from k = 0.1 to 8 by default', () => {
    const curve = neutralCurve(problem);
    expect(curve.wavenumber).toHaveLength(80);
    expect(curve.wavenumber[0]).toBeCloseTo(0.1, 12);
    expect(curve.wavenumber[79]).toBeCloseTo(8, 12);
  });

  it('reports ±Infinity on the curve where no stationary mode exists (heated from above)', () => {
    const curve = neutralCurve({ ...problem, rayleigh: -200 }, { points: 3 });
    expect(curve.factor).toEqual([Infinity, Infinity, Infinity]);
    expect(curve.rayleigh).toEqual([-Infinity, -Infinity, -Infinity]);
  });

  it('rejects bad options naming the field', () => {
    expect(() => neutralCurve(problem, { wavenumberMin: 0 })).toThrow(/wavenumberMin/);
    expect(() => neutralCurve(problem, { wavenumberMin: 2, wavenumberMax: 1 })).toThrow(/wavenumberMax/);
    expect(() => neutralCurve(problem, { points: 1 })).toThrow(/points/);
    expect(() => neutralCurve(problem, { points: 2.5 })).toThrow(/points/);
  });
});
