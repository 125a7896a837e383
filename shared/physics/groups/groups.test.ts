import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  biotNumber,
  bondNumber,
  crispationNumber,
  dynamicBondNumber,
  galileoNumber,
  kinematicViscosity,
  marangoniNumber,
  massTransferBiotNumber,
  prandtlNumber,
  rayleighNumber,
  solutalMarangoniNumber,
  thermalDiffusivity,
} from './index';

const rel = (actual: number, expected: number) => Math.abs(actual / expected - 1);

// Every expected value below is a hand calculation written out beside the check, from the definitions in
// the cited papers (Rayleigh 1916; Pearson 1958; Nield 1964; Davis 1987; Scriven & Sternling 1964;
// VanHook et al. 1997; Sternling & Scriven 1959).
describe('dimensionless groups: hand calculations', () => {
  it('thermal diffusivity of water at 20 °C from k, ρ, c_p (Bergman et al. 2011 eq. 2.22)', () => {
    // 0.598 / (998.2 × 4182) = 0.598 / 4_174_472.4 = 1.43251e-7 m²/s
    expect(rel(thermalDiffusivity({ conductivity: 0.598, density: 998.2, heatCapacity: 4182 }), 1.43251e-7)).toBeLessThan(1e-5);
  });
  it('kinematic viscosity: 1.0016e-3 / 998.2 = 1.003406e-6 m²/s', () => {
    expect(rel(kinematicViscosity({ viscosity: 1.0016e-3, density: 998.2 }), 1.003406e-6)).toBeLessThan(1e-6);
  });
  it('Rayleigh (Rayleigh 1916): 9.81 × 2e-4 × 1 × 1e-6 / (1e-6 × 1.4e-7) = 14014.29', () => {
    const ra = rayleighNumber({ gravity: 9.81, expansion: 2e-4, deltaT: 1, depth: 0.01, kinematicViscosity: 1e-6, thermalDiffusivity: 1.4e-7 });
    expect(rel(ra, 14014.2857)).toBeLessThan(1e-6);
  });
  it('Marangoni (Pearson 1958): 1e-4 × 1 × 1e-3 / (1e-2 × 1e-7) = 100; sign follows −dσ/dT·ΔT', () => {
    const input = { surfaceTensionSlope: -1e-4, deltaT: 1, depth: 1e-3, viscosity: 1e-2, thermalDiffusivity: 1e-7 };
    expect(rel(marangoniNumber(input), 100)).toBeLessThan(1e-12);
    expect(marangoniNumber({ ...input, deltaT: -1 })).toBeLessThan(0);
    expect(marangoniNumber({ ...input, surfaceTensionSlope: 1e-4 })).toBeLessThan(0);
  });
  it('Biot (Pearson 1958, L = hd/k): 100 × 50e-6 / 0.15 = 0.03333', () => {
    expect(rel(biotNumber({ heatTransfer: 100, depth: 50e-6, conductivity: 0.15 }), 1 / 30)).toBeLessThan(1e-12);
  });
  it('Prandtl: 1.0034e-6 / 1.4325e-7 = 7.0045', () => {
    expect(rel(prandtlNumber({ kinematicViscosity: 1.0034e-6, thermalDiffusivity: 1.4325e-7 }), 7.00454)).toBeLessThan(1e-5);
  });
  it('static Bond (Davis 1987): 1000 × 9.81 × 1e-6 / 0.07 = 0.140143', () => {
    expect(rel(bondNumber({ density: 1000, gravity: 9.81, depth: 1e-3, surfaceTension: 0.07 }), 0.140143)).toBeLessThan(1e-5);
  });
  it('dynamic Bond (Nield 1964): solvent ρ 900, β 1e-3, |dσ/dT| 0.1 mN/(m·K): 2.207e-4 at 50 µm, 0.3532 at 2 mm', () => {
    const base = { density: 900, gravity: 9.81, expansion: 1e-3, surfaceTensionSlope: -1e-4 };
    // 900 × 9.81 × 1e-3 × (50e-6)² / 1e-4 = 2.20725e-4 ; × (2e-3/50e-6)² = × 1600 → 0.35316
    expect(rel(dynamicBondNumber({ ...base, depth: 50e-6 }), 2.20725e-4)).toBeLessThan(1e-6);
    expect(rel(dynamicBondNumber({ ...base, depth: 2e-3 }), 0.35316)).toBeLessThan(1e-5);
  });
  it('dynamic Bond equals Ra/Ma for the same layer (definition, Nield 1964)', () => {
    const rho = 900, mu = 0.01, k = 0.15, cp = 2000, beta = 1e-3, slope = -1e-4, d = 1e-3, dT = 3;
    const kappa = k / (rho * cp);
    const ra = rayleighNumber({ gravity: 9.81, expansion: beta, deltaT: dT, depth: d, kinematicViscosity: mu / rho, thermalDiffusivity: kappa });
    const ma = marangoniNumber({ surfaceTensionSlope: slope, deltaT: dT, depth: d, viscosity: mu, thermalDiffusivity: kappa });
    expect(rel(dynamicBondNumber({ density: rho, gravity: 9.81, expansion: beta, depth: d, surfaceTensionSlope: slope }), ra / ma)).toBeLessThan(1e-12);
  });
  it('crispation (Scriven & Sternling 1964): 1e-2 × 1e-7 / (0.025 × 1e-4) = 4e-4', () => {
    expect(rel(crispationNumber({ viscosity: 1e-2, thermalDiffusivity: 1e-7, surfaceTension: 0.025, depth: 1e-4 }), 4e-4)).toBeLessThan(1e-12);
  });
  it('Galileo (VanHook et al. 1997) = Bo/Cr: 9.81 × 1e-12 / (1e-5 × 1e-7) = 9.81', () => {
    expect(rel(galileoNumber({ gravity: 9.81, depth: 1e-4, kinematicViscosity: 1e-5, thermalDiffusivity: 1e-7 }), 9.81)).toBeLessThan(1e-12);
    const rho = 1000, mu = 1e-2, sigma = 0.025, kappa = 1e-7, d = 1e-4;
    const bo = bondNumber({ density: rho, gravity: 9.81, depth: d, surfaceTension: sigma });
    const cr = crispationNumber({ viscosity: mu, thermalDiffusivity: kappa, surfaceTension: sigma, depth: d });
    expect(rel(galileoNumber({ gravity: 9.81, depth: d, kinematicViscosity: mu / rho, thermalDiffusivity: kappa }), bo / cr)).toBeLessThan(1e-12);
  });
  it('solutal Marangoni (Sternling & Scriven 1959): 0.015 × 0.05 × 50e-6 / (0.01 × 1e-10) = 37500', () => {
    const ma = solutalMarangoniNumber({ surfaceTensionConcentrationSlope: -0.015, concentrationDifference: 0.05, depth: 50e-6, viscosity: 0.01, diffusivity: 1e-10 });
    expect(rel(ma, 37500)).toBeLessThan(1e-12);
  });
  it('mass-transfer Biot: 1e-6 × 50e-6 / 1e-10 = 0.5', () => {
    expect(rel(massTransferBiotNumber({ massTransferCoefficient: 1e-6, depth: 50e-6, diffusivity: 1e-10 }), 0.5)).toBeLessThan(1e-12);
  });
});

describe('dimensionless groups: bad input names the field', () => {
  it('refuses a zero depth and a non-finite ΔT', () => {
    expect(() => marangoniNumber({ surfaceTensionSlope: -1e-4, deltaT: 1, depth: 0, viscosity: 1, thermalDiffusivity: 1 })).toThrow(/depth must be > 0/);
    expect(() => rayleighNumber({ gravity: 9.81, expansion: 1e-4, deltaT: Number.NaN, depth: 1, kinematicViscosity: 1, thermalDiffusivity: 1 })).toThrow(/deltaT must be a finite number/);
  });
  it('property: any non-finite input to the Rayleigh number is refused with the field name', () => {
    const fields = ['gravity', 'expansion', 'deltaT', 'depth', 'kinematicViscosity', 'thermalDiffusivity'] as const;
    fc.assert(
      fc.property(fc.constantFrom(...fields), fc.constantFrom(Number.NaN, Infinity, -Infinity), (field, bad) => {
        const input = { gravity: 9.81, expansion: 2e-4, deltaT: 1, depth: 0.01, kinematicViscosity: 1e-6, thermalDiffusivity: 1.4e-7, [field]: bad };
        expect(() => rayleighNumber(input)).toThrow(new RegExp(`^${field} must be a finite number`));
      }),
    );
  });
});

describe('dimensionless groups: scaling with depth (from the definitions)', () => {
  const positive = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
  it('property: Ra ∝ d³', () => {
    fc.assert(
      fc.property(positive(1e-6, 0.1), positive(0.1, 10), positive(1e-5, 1e-2), (d, factor, beta) => {
        const at = (depth: number) => rayleighNumber({ gravity: 9.81, expansion: beta, deltaT: 5, depth, kinematicViscosity: 1e-6, thermalDiffusivity: 1e-7 });
        expect(rel(at(d * factor) / at(d), factor ** 3)).toBeLessThan(1e-9);
      }),
    );
  });
  it('property: Ma ∝ d', () => {
    fc.assert(
      fc.property(positive(1e-6, 0.1), positive(0.1, 10), positive(1e-6, 1e-3), (d, factor, slope) => {
        const at = (depth: number) => marangoniNumber({ surfaceTensionSlope: -slope, deltaT: 5, depth, viscosity: 1e-3, thermalDiffusivity: 1e-7 });
        expect(rel(at(d * factor) / at(d), factor)).toBeLessThan(1e-9);
      }),
    );
  });
});
