import { describe, expect, it } from 'vitest';
import {
  climbingFilmThickness,
  closedLayerSurfaceSpeed,
  closedLayerVelocity,
  hotSpotThinning,
  openFilmSurfaceSpeed,
  openFilmVelocity,
  spreadingCoefficient,
  thermocapillaryStress,
} from './index';

const rel = (a: number, b: number) => Math.abs(a / b - 1);
const G = 9.80665; // standard gravity, CGPM 1901

describe('lateral-gradient flow (Smith & Davis 1983, J. Fluid Mech. 132:119)', () => {
  // Common practice: dσ/dT ≈ −0.1 mN/(m·K) for ordinary organic liquids; a 1 mm layer of a 10 mPa·s
  // liquid with 10 K over 1 cm flows at about 1 cm/s (order of magnitude, rule of thumb).
  const tau = thermocapillaryStress({ surfaceTensionSlope: -1e-4, temperatureDifference: 10, length: 0.01 });
  it('stress τ = |dσ/dT|ΔT/L = 1e-4 × 10 / 0.01 = 0.1 Pa (hand calculation)', () => {
    expect(rel(tau, 0.1)).toBeLessThan(1e-12);
  });
  it('open film: τd/μ ≈ 1 cm/s for 1 mm, 10 mPa·s, 10 K over 1 cm (common practice, order of magnitude)', () => {
    const u = openFilmSurfaceSpeed({ stress: tau, depth: 1e-3, viscosity: 0.01 });
    expect(u).toBeGreaterThan(0.003);
    expect(u).toBeLessThan(0.03);
    expect(rel(u, 0.01)).toBeLessThan(1e-12); // 0.1 × 1e-3 / 0.01 = 0.01 m/s (hand calculation)
  });
  it('closed layer with return flow: τd/(4μ) = 2.5 mm/s, a quarter of the open film (Smith & Davis 1983)', () => {
    expect(rel(closedLayerSurfaceSpeed({ stress: tau, depth: 1e-3, viscosity: 0.01 }), 0.0025)).toBeLessThan(1e-12);
  });
  it('profiles: open film is linear; closed layer carries no net flux and reverses at ζ = 2/3', () => {
    const args = { stress: 0.1, depth: 1e-3, viscosity: 0.01 };
    expect(rel(openFilmVelocity({ ...args, height: 2.5e-4 }), 0.0025)).toBeLessThan(1e-12);
    // zero net flux: Simpson's rule is exact for a quadratic profile
    const u0 = closedLayerVelocity({ ...args, height: 0 });
    const um = closedLayerVelocity({ ...args, height: 5e-4 });
    const u1 = closedLayerVelocity({ ...args, height: 1e-3 });
    expect(Math.abs((u0 + 4 * um + u1) / 6)).toBeLessThan(1e-15);
    // ¾ζ² − ½ζ = 0 at ζ = 2/3; minimum −τd/(12μ) at ζ = 1/3 (hand calculation)
    expect(Math.abs(closedLayerVelocity({ ...args, height: 2e-3 / 3 }))).toBeLessThan(1e-15);
    expect(rel(closedLayerVelocity({ ...args, height: 1e-3 / 3 }), -0.1 * 1e-3 / (12 * 0.01))).toBeLessThan(1e-12);
  });
  it('refuses a height above the surface', () => {
    expect(() => openFilmVelocity({ stress: 1, depth: 1e-3, viscosity: 1, height: 2e-3 })).toThrow(/height must be ≤ depth/);
  });
});

describe('hot-spot thinning (lubrication balance, Oron, Davis & Bankoff 1997; Tan, Bankoff & Davis 1990)', () => {
  it('small deflection: Δh ≈ 3Δσ/(2ρgh) = 3 × 1e-3 / (2 × 1000 × 9.81 × 1e-3) = 0.1529 mm', () => {
    const r = hotSpotThinning({ surfaceTensionDifference: 1e-3, density: 1000, gravity: 9.81, depth: 1e-3 });
    expect(rel(r.linearDepression, 1.529052e-4)).toBeLessThan(1e-5);
    // full balance: √(1e-6 − 3e-3/9810) = √(6.94190e-7) = 8.33181e-4 m
    expect(rel(r.hotSpotDepth, 8.33181e-4)).toBeLessThan(1e-5);
    expect(r.ruptures).toBe(false);
  });
  it('the full balance approaches the small-deflection estimate for a small Δσ', () => {
    const r = hotSpotThinning({ surfaceTensionDifference: 1e-6, density: 1000, gravity: 9.81, depth: 1e-3 });
    expect(rel(r.depression, r.linearDepression)).toBeLessThan(1e-3);
  });
  it('a thin film under a large Δσ ruptures into a dry spot', () => {
    // 3 × 5e-3 / 9810 = 1.53e-6 m² > (1e-3)² → no steady film
    const r = hotSpotThinning({ surfaceTensionDifference: 5e-3, density: 1000, gravity: 9.81, depth: 1e-3 });
    expect(r.ruptures).toBe(true);
    expect(r.hotSpotDepth).toBe(0);
  });
});

describe('climbing films and spreading', () => {
  it('a film climbs a wall only if thinner than Δσ/(ρgL) ≈ 100 µm for 50 mN/m over 5 cm (common practice; Fanton, Cazabat & Quéré 1996 scaling)', () => {
    const h = climbingFilmThickness({ surfaceTensionDifference: 0.05, density: 1000, gravity: G, length: 0.05 });
    expect(h).toBeGreaterThan(80e-6);
    expect(h).toBeLessThan(120e-6);
    expect(rel(h, 0.05 / (1000 * G * 0.05))).toBeLessThan(1e-12); // 1.0197e-4 m (hand calculation)
  });
  it('spreading coefficient 32 − 25 − 5 = +2 mN/m spreads (Harkins & Feldman 1922; de Gennes 1985)', () => {
    const s = spreadingCoefficient({ solidSurfaceEnergy: 0.032, liquidSurfaceTension: 0.025, interfacialTension: 0.005 });
    expect(s).toBeCloseTo(0.002, 12);
    expect(s).toBeGreaterThan(0);
    expect(spreadingCoefficient({ solidSurfaceEnergy: 0.02, liquidSurfaceTension: 0.072, interfacialTension: 0.01 })).toBeLessThan(0);
  });
});
