import { describe, expect, it } from 'vitest';
import refs from '../../../tests/fixtures/stability-references.json';
import { criticalRayleigh } from './critical-rayleigh';
import type { BottomMechanics, TopKind } from './types';

const relative = (value: number, expected: number) => Math.abs(value - expected) / Math.abs(expected);

describe('criticalRayleigh: Rayleigh–Bénard with both walls conducting', () => {
  // Chandrasekhar 1961, Hydrodynamic and Hydromagnetic Stability, ch. II; Reid & Harris 1958 Phys. Fluids 1:102.
  // The table gives Ra_c to 7 and 6 significant digits; k_c to 4.
  for (const ref of refs.rayleighBenard) {
    it(`${ref.case}: Ra_c = ${ref.rayleigh} at k_c = ${ref.wavenumber.toFixed(3)} (${ref.source})`, () => {
      const result = criticalRayleigh({
        bottom: ref.bottom as BottomMechanics,
        bottomThermal: 'conducting',
        top: ref.top as TopKind,
        biot: Infinity,
      });
      expect(relative(result.value, ref.rayleigh)).toBeLessThan(1e-5);
      expect(Math.abs(result.wavenumber - ref.wavenumber)).toBeLessThan(1e-3);
    });
  }

  it('free/free equals 27π⁴/4 = 657.511 to 1e-7 (Rayleigh 1916; Chandrasekhar 1961 §15, exact)', () => {
    const result = criticalRayleigh({ bottom: 'free', bottomThermal: 'conducting', top: 'free', biot: Infinity });
    expect(relative(result.value, (27 * Math.PI ** 4) / 4)).toBeLessThan(1e-7);
  });
});

describe('criticalRayleigh: insulating top (Nield 1964)', () => {
  it(`rigid conducting bottom, free flat insulating top, Bi = 0: Ra_c = 669.00 at k_c = 2.086 (${refs.nield.source})`, () => {
    const result = criticalRayleigh({ bottom: 'rigid', bottomThermal: 'conducting', top: 'free', biot: 0 });
    // Nield gives 5 significant digits (669.00): tolerance half a unit in the last digit.
    expect(Math.abs(result.value - refs.nield.rayleigh)).toBeLessThan(0.005);
    expect(Math.abs(result.wavenumber - refs.nield.wavenumber)).toBeLessThan(1e-3);
  });

  it("a 'surface' top with Ma = 0 behaves as Nield's free insulating top", () => {
    const result = criticalRayleigh({ bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', biot: 0 });
    expect(Math.abs(result.value - refs.nield.rayleigh)).toBeLessThan(0.005);
  });

  it('Ra_c rises from the insulating (669.00, Nield 1964) to the conducting free top (1100.65, Chandrasekhar 1961) as Bi grows', () => {
    const values = [0, 0.1, 1, 10, 100].map(
      (biot) => criticalRayleigh({ bottom: 'rigid', bottomThermal: 'conducting', top: 'free', biot }).value,
    );
    for (let i = 1; i < values.length; i++) expect(values[i]).toBeGreaterThan(values[i - 1]);
    expect(values[0]).toBeCloseTo(669.0, 2);
    expect(values[values.length - 1]).toBeLessThan(1100.65);
    expect(values[values.length - 1]).toBeGreaterThan(1050);
  });
});

describe('criticalRayleigh: both walls insulating (fixed heat flux)', () => {
  // Values from memory (Sparrow, Goldstein & Jonsson 1964; Chapman & Proctor 1980): the minimum sits at k → 0.
  for (const ref of refs.insulatingWalls) {
    it(`${ref.case}: Ra_c = ${ref.rayleigh} as k → 0 (${ref.source})`, () => {
      const result = criticalRayleigh({
        bottom: ref.bottom as BottomMechanics,
        bottomThermal: 'insulating',
        top: ref.top as TopKind,
        biot: 0,
      });
      expect(relative(result.value, ref.rayleigh)).toBeLessThan(1e-5);
      expect(result.wavenumber).toBe(0);
    });
  }
});

describe('criticalRayleigh: input checks', () => {
  it('rejects a NaN Biot number with a RangeError naming biot', () => {
    expect(() => criticalRayleigh({ bottom: 'rigid', bottomThermal: 'conducting', top: 'free', biot: Number.NaN })).toThrow(/biot/);
  });
  it('rejects a negative Biot number', () => {
    expect(() => criticalRayleigh({ bottom: 'rigid', bottomThermal: 'conducting', top: 'free', biot: -1 })).toThrow(RangeError);
  });
  it('rejects an unknown top kind naming top', () => {
    expect(() => criticalRayleigh({ bottom: 'rigid', bottomThermal: 'conducting', top: 'lid' as TopKind, biot: 0 })).toThrow(/top/);
  });
});
