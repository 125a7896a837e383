import { describe, expect, it } from 'vitest';
import refs from '../../../tests/fixtures/stability-references.json';
import { criticalMarangoni } from './critical-marangoni';
import type { LayerBoundaries } from './types';

/** Pearson's closed form, J. Fluid Mech. 4:489 (1958), rigid conducting bottom, flat surface, Biot top. */
const pearsonMarangoni = (k: number, biot: number) =>
  (8 * k * (k * Math.cosh(k) + biot * Math.sinh(k)) * (k - Math.sinh(k) * Math.cosh(k))) / (k ** 3 * Math.cosh(k) - Math.sinh(k) ** 3);

/** Golden-section minimum of Pearson's closed form on [1, 5]: an implementation independent of the solver. */
function pearsonMinimum(biot: number): { value: number; wavenumber: number } {
  let a = 1;
  let b = 5;
  const g = (Math.sqrt(5) - 1) / 2;
  for (let i = 0; i < 80; i++) {
    const c = b - g * (b - a);
    const d = a + g * (b - a);
    if (pearsonMarangoni(c, biot) < pearsonMarangoni(d, biot)) b = d;
    else a = c;
  }
  const k = (a + b) / 2;
  return { value: pearsonMarangoni(k, biot), wavenumber: k };
}

const surface = (biot: number, bottomThermal: LayerBoundaries['bottomThermal'] = 'conducting'): LayerBoundaries => ({
  bottom: 'rigid',
  bottomThermal,
  top: 'surface',
  biot,
});

describe('criticalMarangoni (Pearson 1958)', () => {
  it(`Bi = 0: Ma_c = 79.607 at k_c = 1.993 (${refs.pearson.source})`, () => {
    const result = criticalMarangoni(surface(0));
    // Pearson gives 5 significant digits: within half a unit of the last digit.
    expect(Math.abs(result.value - refs.pearson.marangoni)).toBeLessThan(0.0005);
    expect(Math.abs(result.wavenumber - refs.pearson.wavenumber)).toBeLessThan(1e-3);
  });

  for (const biot of [0.1, 1, 3, 10]) {
    it(`Bi = ${biot}: agrees with the minimum of Pearson's closed form Ma(k) to 1e-6 (Pearson 1958)`, () => {
      const expected = pearsonMinimum(biot);
      const result = criticalMarangoni(surface(biot));
      expect(Math.abs(result.value - expected.value) / expected.value).toBeLessThan(1e-6);
      expect(Math.abs(result.wavenumber - expected.wavenumber)).toBeLessThan(2e-3);
    });
  }

  it('Ma_c rises with Bi (Pearson 1958)', () => {
    const values = [0, 0.5, 2, 8, 30].map((biot) => criticalMarangoni(surface(biot)).value);
    for (let i = 1; i < values.length; i++) expect(values[i]).toBeGreaterThan(values[i - 1]);
  });

  it('a conducting top (Bi = ∞) has no thermocapillary onset: Infinity (Pearson 1958: Ma_c → ∞ as Bi → ∞)', () => {
    const result = criticalMarangoni(surface(Infinity));
    expect(result.value).toBe(Infinity);
  });

  it(`insulating bottom, Bi = 0: Ma → 48 as k → 0 (${refs.pearsonInsulatingBottom.source})`, () => {
    const result = criticalMarangoni(surface(0, 'insulating'));
    expect(Math.abs(result.value - 48) / 48).toBeLessThan(1e-5);
    expect(result.wavenumber).toBe(0);
  });

  it('insulating bottom with a small Biot number moves the minimum off k = 0 and above 48 (Pearson 1958)', () => {
    const result = criticalMarangoni(surface(0.05, 'insulating'));
    expect(result.value).toBeGreaterThan(48);
    expect(result.wavenumber).toBeGreaterThan(0);
  });

  it("rejects a top that is not 'surface' with a RangeError naming top", () => {
    expect(() => criticalMarangoni({ bottom: 'rigid', bottomThermal: 'conducting', top: 'free', biot: 0 })).toThrow(RangeError);
    expect(() => criticalMarangoni({ bottom: 'rigid', bottomThermal: 'conducting', top: 'rigid', biot: 0 })).toThrow(/top/);
  });
  it('a wavenumber hint changes the cost, not the answer: Ma_c = 79.607 from hints 1.2, 2.6 and 5 (Pearson 1958)', () => {
    const cold = criticalMarangoni(surface(0, 'conducting'));
    for (const wavenumberHint of [1.2, 2.6, 5]) {
      const hinted = criticalMarangoni(surface(0, 'conducting'), { wavenumberHint });
      expect(Math.abs(hinted.value / 79.607 - 1)).toBeLessThan(1e-5);
      expect(Math.abs(hinted.value / cold.value - 1)).toBeLessThan(1e-7);
    }
    expect(() => criticalMarangoni(surface(0, 'conducting'), { wavenumberHint: -1 })).toThrow(/wavenumberHint/);
  });
});
