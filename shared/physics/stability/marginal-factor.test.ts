import { describe, expect, it } from 'vitest';
import { marginalFactor } from './marginal-factor';
import type { StabilityProblem } from './types';

/** Pearson's closed form, J. Fluid Mech. 4:489 (1958): neutral Ma(k), rigid conducting bottom, flat Biot top, Ra = 0. */
const pearsonMarangoni = (k: number, biot: number) =>
  (8 * k * (k * Math.cosh(k) + biot * Math.sinh(k)) * (k - Math.sinh(k) * Math.cosh(k))) / (k ** 3 * Math.cosh(k) - Math.sinh(k) ** 3);

/** Neutral Ra(k) = (π² + k²)³/k² for free/free conducting walls (Rayleigh 1916; Chandrasekhar 1961 §15). */
const freeFreeRayleigh = (k: number) => (Math.PI ** 2 + k * k) ** 3 / (k * k);

const pearsonProblem = (biot: number, marangoni: number): StabilityProblem => ({
  bottom: 'rigid',
  bottomThermal: 'conducting',
  top: 'surface',
  biot,
  rayleigh: 0,
  marangoni,
});

describe("marginalFactor against Pearson's closed form (Pearson 1958)", () => {
  for (const biot of [0, 0.3, 1, 5, 20]) {
    it(`Bi = ${biot}: λ(k)·Ma equals Pearson's Ma(k) to 1e-6 for 0.2 ≤ k ≤ 6`, () => {
      for (const k of [0.2, 0.5, 1, 1.5, 2, 2.5, 3, 4, 5, 6]) {
        const expected = pearsonMarangoni(k, biot);
        const factor = marginalFactor(pearsonProblem(biot, 50), k);
        expect(Math.abs(factor * 50 - expected) / expected).toBeLessThan(1e-6);
      }
    });
  }

  it('a negative Ma (dσ/dT > 0) on the same boundaries has no stationary onset: Infinity (Pearson 1958: only Ma > 0 is unstable)', () => {
    expect(marginalFactor(pearsonProblem(0, -50), 2)).toBe(Infinity);
  });
});

describe('marginalFactor against the free/free closed form (Chandrasekhar 1961, ch. II §15)', () => {
  it('λ(k)·Ra equals (π² + k²)³/k² to 1e-7 for 0.3 ≤ k ≤ 8', () => {
    for (const k of [0.3, 1, 2, Math.PI / Math.SQRT2, 3, 5, 8]) {
      const factor = marginalFactor({ bottom: 'free', bottomThermal: 'conducting', top: 'free', biot: Infinity, rayleigh: 100, marangoni: 0 }, k);
      expect(Math.abs(factor * 100 - freeFreeRayleigh(k)) / freeFreeRayleigh(k)).toBeLessThan(1e-7);
    }
  });

  it('heating from above (Ra < 0) alone has no stationary onset: Infinity (Chandrasekhar 1961, ch. II: only Ra > 0 is unstable)', () => {
    expect(marginalFactor({ bottom: 'free', bottomThermal: 'conducting', top: 'free', biot: Infinity, rayleigh: -100, marangoni: 0 }, 2)).toBe(Infinity);
  });
});

describe('marginalFactor on a deformable surface', () => {
  it("returns Pearson's Ma(k) as the crispation number tends to 0 (Davis 1987; VanHook et al. 1997)", () => {
    for (const k of [0.5, 1, 2, 3]) {
      const factor = marginalFactor({ ...pearsonProblem(0.5, 50), crispation: 1e-10, bond: 0.3 }, k);
      const expected = pearsonMarangoni(k, 0.5);
      expect(Math.abs(factor * 50 - expected) / expected).toBeLessThan(1e-5);
    }
  });

  it('approaches Ma_LW = (2/3)·Ga·(1 + Bi) as k → 0 (VanHook et al. 1997, J. Fluid Mech. 345:45)', () => {
    const crispation = 2e-3;
    const bond = 0.05;
    const biot = 0.4;
    const expected = (2 / 3) * (bond / crispation) * (1 + biot);
    const factor = marginalFactor({ ...pearsonProblem(biot, 10), crispation, bond }, 1e-4);
    expect(Math.abs(factor * 10 - expected) / expected).toBeLessThan(1e-4);
  });

  it('a deformable surface is never more stable than the flat one at the same k (surface deflection adds a destabilising long-wave path, Davis 1987)', () => {
    for (const k of [0.3, 1, 2]) {
      const flat = marginalFactor(pearsonProblem(0.2, 50), k);
      const deformable = marginalFactor({ ...pearsonProblem(0.2, 50), crispation: 1e-3, bond: 0.1 }, k);
      expect(deformable).toBeLessThanOrEqual(flat * (1 + 1e-9));
    }
  });
});

describe('marginalFactor input checks', () => {
  const ok = pearsonProblem(0, 50);
  it.each([0, -1, Number.NaN, Infinity])('rejects wavenumber %s with a RangeError naming wavenumber', (k) => {
    expect(() => marginalFactor(ok, k)).toThrow(/wavenumber/);
  });
  it('rejects crispation on a rigid top', () => {
    expect(() => marginalFactor({ ...ok, top: 'rigid', crispation: 1e-3, bond: 1 }, 2)).toThrow(/crispation/);
  });
  it('requires bond when crispation > 0', () => {
    expect(() => marginalFactor({ ...ok, crispation: 1e-3 }, 2)).toThrow(/bond/);
  });
  it('rejects a negative bond', () => {
    expect(() => marginalFactor({ ...ok, crispation: 1e-3, bond: -1 }, 2)).toThrow(/bond/);
  });
  it('returns Infinity when both drives are zero', () => {
    expect(marginalFactor({ ...ok, marangoni: 0 }, 2)).toBe(Infinity);
  });
});
