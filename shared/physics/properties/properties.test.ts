import { describe, expect, it } from 'vitest';
import water from '../../../tests/fixtures/water-properties.json';
import {
  andradeViscosity,
  fitAndradeViscosity,
  linearDensity,
  linearSurfaceTension,
  waterDensity,
  waterSurfaceTension,
  waterSurfaceTensionSlope,
  waterViscosity,
  waterViscosityFromDensity,
} from './index';

const K0 = 273.15; // 0 °C in K, exact (SI Brochure 2019)

describe('water surface tension, IAPWS R1-76(2014)', () => {
  it.each(water.surfaceTension.points)('matches the release table at $celsius °C ($value mN/m)', ({ celsius, value }) => {
    expect(Math.abs(waterSurfaceTension(K0 + celsius) * 1e3 - value)).toBeLessThanOrEqual(0.005);
  });
  it('has a slope of about −0.155 mN/(m·K) near 25 °C (IAPWS R1-76 table difference 20–30 °C)', () => {
    const slope = waterSurfaceTensionSlope(K0 + water.surfaceTensionSlope.celsius) * 1e3;
    expect(Math.abs(slope / water.surfaceTensionSlope.value - 1)).toBeLessThan(water.surfaceTensionSlope.relativeTolerance);
  });
  it('refuses temperatures outside the formulation', () => {
    expect(() => waterSurfaceTension(700)).toThrow(/647.096 K/);
    expect(() => waterSurfaceTension(Number.NaN)).toThrow(/temperature must be a finite number/);
  });
});

describe('water viscosity, IAPWS R12-08 (2008)', () => {
  it.each(water.viscosityCheckValues.points)(
    'reproduces the release check value at $kelvin K, $density kg/m³ ($value µPa·s)',
    ({ kelvin, density, value }) => {
      const mu = waterViscosityFromDensity(kelvin, density) * 1e6;
      expect(Math.abs(mu - value)).toBeLessThanOrEqual(water.viscosityCheckValues.absoluteTolerance); // one unit in the last printed digit
    },
  );
  it('gives 1.0016 mPa·s for liquid water at 20 °C and 0.1 MPa', () => {
    expect(Math.abs(waterViscosity(K0 + 20) * 1e3 - water.viscosityAt20C.value)).toBeLessThanOrEqual(water.viscosityAt20C.absoluteTolerance);
  });
  it('uses a liquid density with its maximum near 4 °C (Kell 1975)', () => {
    expect(Math.abs(waterDensity(K0 + 4) - water.densityAt4C.value)).toBeLessThan(water.densityAt4C.absoluteTolerance);
    expect(waterDensity(K0 + 4)).toBeGreaterThan(waterDensity(K0 + 1));
    expect(waterDensity(K0 + 4)).toBeGreaterThan(waterDensity(K0 + 8));
  });
});

describe('Andrade viscosity law (Andrade 1930) and its least-squares fit', () => {
  it('passes exactly through two points: 1 mPa·s at 300 K and 0.4 mPa·s at 350 K', () => {
    // hand calculation: B = ln(1e-3/4e-4)/(1/300 − 1/350) = 0.916291/4.7619e-4 = 1924.21 K
    const fit = fitAndradeViscosity([
      { temperature: 300, viscosity: 1e-3 },
      { temperature: 350, viscosity: 4e-4 },
    ]);
    expect(Math.abs(fit.activationTemperature / 1924.2108 - 1)).toBeLessThan(1e-6);
    expect(Math.abs(andradeViscosity(fit, 300) / 1e-3 - 1)).toBeLessThan(1e-12);
    expect(Math.abs(andradeViscosity(fit, 350) / 4e-4 - 1)).toBeLessThan(1e-12);
    expect(fit.rmsLogResidual).toBeLessThan(1e-12);
  });
  it('fits several noisy points with a non-zero residual', () => {
    const fit = fitAndradeViscosity([
      { temperature: 290, viscosity: 1.2e-3 },
      { temperature: 310, viscosity: 0.8e-3 },
      { temperature: 330, viscosity: 0.62e-3 },
    ]);
    expect(fit.rmsLogResidual).toBeGreaterThan(0);
    expect(fit.activationTemperature).toBeGreaterThan(0);
    expect(fit.points).toBe(3);
  });
  it('refuses one point and equal temperatures', () => {
    expect(() => fitAndradeViscosity([{ temperature: 300, viscosity: 1e-3 }])).toThrow(/at least 2/);
    expect(() => fitAndradeViscosity([{ temperature: 300, viscosity: 1e-3 }, { temperature: 300, viscosity: 2e-3 }])).toThrow(/two different temperatures/);
  });
});

describe('linear property laws (Boussinesq; Eötvös-type linear σ)', () => {
  it('density falls by ρβΔT: 1000 × (1 − 2e-4 × 10) = 998 kg/m³', () => {
    expect(linearDensity({ referenceDensity: 1000, referenceTemperature: 293.15, expansion: 2e-4 }, 303.15)).toBeCloseTo(998, 10);
  });
  it('surface tension falls by |dσ/dT|ΔT: 25 − 0.1 × 20 = 23 mN/m', () => {
    expect(linearSurfaceTension({ referenceSurfaceTension: 0.025, referenceTemperature: 293.15, slope: -1e-4 }, 313.15)).toBeCloseTo(0.023, 12);
  });
});
