import { describe, expect, it } from 'vitest';
import { FE_S_ADSORPTION_PARAMETERS } from './fe-s-adsorption-parameters';
import { sulfurActivityFromPpm } from './sulfur-activity-from-ppm';
import { surfaceTensionSignChangeTemperature } from './surface-tension-sign-change-temperature';
import { surfaceTensionTemperatureDerivative } from './surface-tension-temperature-derivative';
import { surfaceTensionWithSoluteAdsorption } from './surface-tension-with-solute-adsorption';

// Sources and hand calculations: tests/fixtures/melt-pool-sources.md.

describe('surfaceTensionWithSoluteAdsorption (Sahoo, DebRoy & McNallan 1988)', () => {
  it('reduces to the pure-iron line γ_m° − A(T − T_m) as the activity goes to 0', () => {
    expect(surfaceTensionWithSoluteAdsorption(1809, 0)).toBeCloseTo(1.943, 12);
    expect(surfaceTensionWithSoluteAdsorption(2000, 0)).toBeCloseTo(1.943 - 4.3e-4 * (2000 - 1809), 12); // 1.86087
    expect(surfaceTensionWithSoluteAdsorption(2000, 1e-12)).toBeCloseTo(1.86087, 9);
  });

  it('matches hand calculations of the published formula with 100 and 50 ppm sulfur', () => {
    // Independent evaluation of the 1988 formula (calculator; R = 8.314462618 J/(mol·K)).
    expect(surfaceTensionWithSoluteAdsorption(1809, 0.01)).toBeCloseTo(1.729825, 5);
    expect(surfaceTensionWithSoluteAdsorption(2000, 0.01)).toBeCloseTo(1.747646, 5);
    expect(surfaceTensionWithSoluteAdsorption(1900, 0.005)).toBeCloseTo(1.809663, 5);
  });

  it('is lowered by sulfur at any temperature (surface-active solute, Gibbs adsorption)', () => {
    for (const t of [1809, 2000, 2400]) {
      expect(surfaceTensionWithSoluteAdsorption(t, 0.003)).toBeLessThan(surfaceTensionWithSoluteAdsorption(t, 0));
      expect(surfaceTensionWithSoluteAdsorption(t, 0.03)).toBeLessThan(surfaceTensionWithSoluteAdsorption(t, 0.003));
    }
  });

  it('rejects T ≤ 0 K and negative activity, naming the field and unit', () => {
    expect(() => surfaceTensionWithSoluteAdsorption(0, 0.01)).toThrow(/temperature must be a finite number > 0 K/);
    expect(() => surfaceTensionWithSoluteAdsorption(1900, -1)).toThrow(/activity must be a finite number ≥ 0 wt %/);
  });
});

describe('surfaceTensionTemperatureDerivative', () => {
  it('is −A = −4.3×10⁻⁴ N/(m·K) for pure iron (Sahoo et al. 1988)', () => {
    for (const t of [1809, 1850, 2200, 2800]) {
      expect(surfaceTensionTemperatureDerivative(t, 0)).toBeCloseTo(-4.3e-4, 15);
    }
  });

  it('equals a central finite difference of γ(T, a) to 1×10⁻⁸ N/(m·K)', () => {
    const h = 0.01;
    for (const a of [0.0005, 0.003, 0.006, 0.02, 0.1]) {
      for (const t of [1809, 1900, 2100, 2500]) {
        const fd =
          (surfaceTensionWithSoluteAdsorption(t + h, a) - surfaceTensionWithSoluteAdsorption(t - h, a)) / (2 * h);
        expect(Math.abs(surfaceTensionTemperatureDerivative(t, a) - fd)).toBeLessThan(1e-8);
      }
    }
  });

  it('follows the published sulfur band at 1850 K: negative at ≤ 30 ppm, positive at ≥ 70 ppm (Mills et al. 1998; Mills & Keene 1990)', () => {
    for (const ppm of [0, 5, 10, 20, 30]) {
      expect(surfaceTensionTemperatureDerivative(1850, sulfurActivityFromPpm(ppm))).toBeLessThan(0);
    }
    for (const ppm of [70, 100, 150, 300]) {
      expect(surfaceTensionTemperatureDerivative(1850, sulfurActivityFromPpm(ppm))).toBeGreaterThan(0);
    }
  });
});

describe('surfaceTensionSignChangeTemperature', () => {
  it('finds no sign change for pure iron and says the slope stays negative', () => {
    const result = surfaceTensionSignChangeTemperature(0);
    expect(result.found).toBe(false);
    if (!result.found) {
      expect(result.slopeSign).toBe('negative');
      expect(result.message).toMatch(/stays negative .* outward/);
    }
  });

  it('reports a positive slope throughout when the change lies above the searched range', () => {
    const result = surfaceTensionSignChangeTemperature(0.03, { lower: 1809, upper: 2000 });
    expect(result).toMatchObject({ found: false, slopeSign: 'positive' });
  });

  it('puts the sign change for 30–70 ppm S just above melting, as the band at ~1850 K implies', () => {
    const at30 = surfaceTensionSignChangeTemperature(sulfurActivityFromPpm(30));
    const at70 = surfaceTensionSignChangeTemperature(sulfurActivityFromPpm(70));
    // 30 ppm: negative already at 1850 K → sign change below 1850 K (or none above T_m).
    expect(at30.found ? at30.temperature < 1850 : at30.slopeSign === 'negative').toBe(true);
    expect(at70.found).toBe(true);
    if (at70.found) expect(at70.temperature).toBeGreaterThan(1850);
  });

  it('lands where dγ/dT = 0 and rises with sulfur content (Sahoo et al. 1988; Mills et al. 1998)', () => {
    let previous = 0;
    for (const ppm of [40, 50, 70, 100, 150, 300, 1000]) {
      const result = surfaceTensionSignChangeTemperature(sulfurActivityFromPpm(ppm));
      expect(result.found).toBe(true);
      if (!result.found) continue;
      expect(Math.abs(surfaceTensionTemperatureDerivative(result.temperature, ppm / 1e4))).toBeLessThan(1e-12);
      expect(result.temperature).toBeGreaterThan(previous);
      previous = result.temperature;
    }
  });

  it('rejects an empty or reversed range', () => {
    expect(() => surfaceTensionSignChangeTemperature(0.01, { lower: 2000, upper: 1900 })).toThrow(/range.upper must be/);
    expect(() => surfaceTensionSignChangeTemperature(0.01, { lower: -5, upper: 1900 })).toThrow(/range.lower/);
  });

  it('uses the Sahoo et al. (1988) Fe–S constants', () => {
    expect(FE_S_ADSORPTION_PARAMETERS).toEqual({
      pureSurfaceTensionAtMelting: 1.943,
      pureTemperatureCoefficient: 4.3e-4,
      meltingTemperature: 1809,
      saturationSurfaceExcess: 1.3e-5,
      segregationEntropyFactor: 3.18e-3,
      adsorptionEnthalpy: -1.66e5,
    });
  });
});

describe('sulfurActivityFromPpm', () => {
  it('converts ppm to wt % (1 wt % = 10 000 ppm)', () => {
    expect(sulfurActivityFromPpm(50)).toBeCloseTo(0.005, 15);
    expect(() => sulfurActivityFromPpm(-1)).toThrow(/sulfurPpm must be from 0 to 10000 ppm/);
  });
});
