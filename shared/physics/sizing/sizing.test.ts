import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import refs from '../../../tests/fixtures/onset-references.json';
import { evaluateLayer } from './evaluate-layer';
import { maxStableDepth } from './max-stable-depth';
import { minStableDepth } from './min-stable-depth';
import { quietWindow } from './quiet-window';
import type { PhysicalLayer } from './types';

const G = 9.80665; // standard gravity (CGPM 1901)
const rel = (a: number, b: number) => Math.abs(a / b - 1);

// A thermocapillary layer with no buoyancy (β = 0) and an insulating top (h = 0): κ = 0.1/(1000 × 1000) = 1e-7 m²/s.
const marangoniLayer: PhysicalLayer = {
  bottom: 'rigid', bottomThermal: 'conducting', top: 'surface',
  density: 1000, viscosity: 0.01, conductivity: 0.1, heatCapacity: 1000, expansion: 0,
  surfaceTension: 0.03, dSigmaDT: -1e-4, depth: 1e-4, deltaT: 10, heatTransfer: 0, gravity: G,
};
// A buoyancy layer with no thermocapillarity (dσ/dT = 0), insulating free top: κ = 0.6/(1000 × 4000) = 1.5e-7 m²/s, ν = 1e-6 m²/s.
const buoyancyLayer: PhysicalLayer = {
  bottom: 'rigid', bottomThermal: 'conducting', top: 'surface',
  density: 1000, viscosity: 1e-3, conductivity: 0.6, heatCapacity: 4000, expansion: 2e-4,
  surfaceTension: 0.07, dSigmaDT: 0, depth: 1e-3, deltaT: 1, heatTransfer: 0, gravity: G,
};

describe('maxStableDepth: the depth where flat cells set in, ΔT held', () => {
  it(`pure thermocapillary, Bi = 0: d = Ma_c μκ/(|dσ/dT| ΔT) with Ma_c = ${refs.pearson.criticalMarangoni} (Pearson 1958)`, () => {
    // 79.607 × 0.01 × 1e-7 / (1e-4 × 10) = 7.9607e-5 m
    const bound = maxStableDepth(marangoniLayer);
    expect(bound.found).toBe(true);
    if (bound.found) expect(rel(bound.depth, (refs.pearson.criticalMarangoni * 0.01 * 1e-7) / (1e-4 * 10))).toBeLessThan(2e-5);
  });
  it(`pure buoyancy, insulating free top: d = (Ra_c νκ/(gβΔT))^(1/3) with Ra_c = ${refs.nield.criticalRayleigh} (Nield 1964)`, () => {
    const expected = ((refs.nield.criticalRayleigh * 1e-6 * 1.5e-7) / (G * 2e-4 * 1)) ** (1 / 3); // ≈ 3.713 mm
    const bound = maxStableDepth(buoyancyLayer);
    expect(bound.found).toBe(true);
    if (bound.found) expect(rel(bound.depth, expected)).toBeLessThan(2e-5);
  });
  it('says there is no bound when the layer is heated from above with ordinary properties', () => {
    const bound = maxStableDepth({ ...buoyancyLayer, deltaT: -1, dSigmaDT: -1e-4 });
    expect(bound).toMatchObject({ found: false, reason: 'quiet-throughout-range' });
  });
});

describe('minStableDepth: the depth below which the long-wave mode thins the film', () => {
  it('Bi = 0: d = √(3|dσ/dT|ΔT/(2ρg)) from Ma_LW = (2/3)Ga (VanHook et al. 1997)', () => {
    // (2/3)·g d³/(νκ) = |σ'|ΔT d/(μκ) → d² = 3|σ'|ΔT/(2ρg) = 3e-3/(2 × 9806.65) → d = 3.9110e-4 m
    const bound = minStableDepth(marangoniLayer);
    expect(bound.found).toBe(true);
    if (bound.found) expect(rel(bound.depth, Math.sqrt((3 * 1e-4 * 10) / (2 * 1000 * G)))).toBeLessThan(1e-4);
  });
  it('Bi > 0: solves (2/3)ρg d²(1 + hd/k) = |dσ/dT|ΔT (VanHook et al. 1997, Ma_LW = (2/3)Ga(1 + Bi))', () => {
    const layer = { ...marangoniLayer, heatTransfer: 500 };
    // independent Newton iteration on f(d) = (2/3)ρg d²(1 + hd/k) − |σ'|ΔT
    let d = 4e-4;
    for (let i = 0; i < 50; i += 1) {
      const f = (2 / 3) * 1000 * G * d * d * (1 + (500 * d) / 0.1) - 1e-3;
      const df = (2 / 3) * 1000 * G * (2 * d + (3 * 500 * d * d) / 0.1);
      d -= f / df;
    }
    const bound = minStableDepth(layer);
    expect(bound.found).toBe(true);
    if (bound.found) expect(rel(bound.depth, d)).toBeLessThan(1e-4);
  });
  it('is not applicable to a rigid top', () => {
    expect(minStableDepth({ ...marangoniLayer, top: 'rigid' })).toMatchObject({ found: false, reason: 'not-applicable' });
  });
});

describe('evaluateLayer', () => {
  const result = evaluateLayer(marangoniLayer);
  it('reports the groups of the layer (hand calculation: Ma = 1e-4 × 10 × 1e-4 / (0.01 × 1e-7) = 100)', () => {
    expect(rel(result.groups.marangoni, 100)).toBeLessThan(1e-12);
    expect(result.groups.rayleigh).toBe(0);
    expect(result.groups.biot).toBe(0);
  });
  it(`gives Pearson's critical Marangoni number ${refs.pearson.criticalMarangoni} at k = ${refs.pearson.wavenumber} and the cell size`, () => {
    expect(result.criticalMarangoni).not.toBeNull();
    expect(rel(result.criticalMarangoni!.value, refs.pearson.criticalMarangoni)).toBeLessThan(2e-5);
    expect(rel(result.criticalWavenumber, refs.pearson.wavenumber)).toBeLessThan(5e-4);
    expect(rel(result.wavelength, (2 * Math.PI * 1e-4) / refs.pearson.wavenumber)).toBeLessThan(5e-4);
    expect(rel(result.hexagonSpacing / result.wavelength, refs.hexagons.spacingOverWavelength)).toBeLessThan(1e-12);
  });
  it('largest ΔT: cells at Ma_c μκ/(|σ′|d) = 7.9607 K, long-wave thinning first at (2/3)ρgd²/|σ′| = 0.65378 K', () => {
    expect(rel(result.maxDeltaT.cellular, refs.pearson.criticalMarangoni / 10)).toBeLessThan(2e-5);
    expect(rel(result.maxDeltaT.mostDangerous, ((2 / 3) * 1000 * G * 1e-8) / 1e-4)).toBeLessThan(1e-4);
    expect(result.longWave).toBe(true);
    expect(result.regimeLabel).toBe('Long-wave thinning');
  });
  it('property: the margin scales as 1/ΔT (Ra, Ma ∝ ΔT; Bi, Cr, Bo independent of ΔT)', () => {
    const base = { ...marangoniLayer, expansion: 5e-4, heatTransfer: 20, depth: 1e-3, deltaT: 1 };
    const margin1 = evaluateLayer(base, { maxDepth: 0.1 }).margin;
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 50, noNaN: true }), (deltaT) => {
        const m = evaluateLayer({ ...base, deltaT }, { maxDepth: 0.1 }).margin;
        expect(rel(m * deltaT, margin1)).toBeLessThan(1e-6);
      }),
      { numRuns: 6 },
    );
  }, 60_000);
  it('property: a non-finite field is refused with an error naming that field', () => {
    const fields = ['density', 'viscosity', 'conductivity', 'heatCapacity', 'expansion', 'surfaceTension', 'dSigmaDT', 'depth', 'deltaT', 'heatTransfer', 'gravity'] as const;
    fc.assert(
      fc.property(fc.constantFrom(...fields), fc.constantFrom(Number.NaN, Infinity, -Infinity), (field, bad) => {
        expect(() => evaluateLayer({ ...marangoniLayer, [field]: bad })).toThrow(new RegExp(`^${field} must be a finite number`));
      }),
      { numRuns: 60 },
    );
  });
});

describe('quietWindow', () => {
  const window = quietWindow(marangoniLayer, { depthMin: 2e-5, depthMax: 2e-3, deltaTMin: -5, deltaTMax: 20, depthPoints: 200, deltaTPoints: 26 });
  it('cell onset follows Pearson: ΔT_c(d) = 79.607 μκ/(|dσ/dT| d) (Pearson 1958)', () => {
    window.depths.forEach((d, i) => {
      expect(rel(window.cellOnsetDeltaT[i]!, (refs.pearson.criticalMarangoni * 0.01 * 1e-7) / (1e-4 * d))).toBeLessThan(2e-3);
    });
  });
  it('long-wave onset follows ΔT_LW(d) = (2/3)ρg d²/|dσ/dT| (VanHook et al. 1997)', () => {
    window.depths.forEach((d, i) => {
      expect(rel(window.longWaveOnsetDeltaT[i]!, ((2 / 3) * 1000 * G * d * d) / 1e-4)).toBeLessThan(2e-3);
    });
  });
  it('margin grid is onset ΔT over ΔT, null at ΔT = 0, and heating from above is quiet for this liquid', () => {
    const j = window.deltaTs.findIndex((t) => t === 10);
    expect(rel(window.margin[j][50]!, window.onsetDeltaT[50]! / 10)).toBeLessThan(1e-12);
    expect(window.margin[window.deltaTs.indexOf(0)][10]).toBeNull();
    expect(window.onsetDeltaTFromAbove.every((v) => v === null)).toBe(true);
    expect(window.operatingPoint.margin).not.toBeNull();
    expect(window.solvedDepths).toBeLessThan(400);
  });
  it('refuses an empty depth range', () => {
    expect(() => quietWindow(marangoniLayer, { depthMin: 1e-3, depthMax: 1e-4, deltaTMin: 0, deltaTMax: 1 })).toThrow(/depthMax must be > depthMin/);
  });
});

describe('evaluateLayer: robustness over finite inputs (property-based)', () => {
  it('property: no exception and no NaN margin for any valid finite layer', () => {
    const layer = fc.record({
      bottom: fc.constantFrom('rigid' as const, 'free' as const),
      bottomThermal: fc.constantFrom('conducting' as const, 'insulating' as const),
      top: fc.constantFrom('rigid' as const, 'free' as const, 'surface' as const),
      density: fc.double({ min: 500, max: 8000, noNaN: true }),
      viscosity: fc.double({ min: 1e-4, max: 10, noNaN: true }),
      conductivity: fc.double({ min: 0.05, max: 50, noNaN: true }),
      heatCapacity: fc.double({ min: 300, max: 5000, noNaN: true }),
      expansion: fc.double({ min: -1e-3, max: 2e-3, noNaN: true }),
      surfaceTension: fc.double({ min: 0.01, max: 2, noNaN: true }),
      dSigmaDT: fc.double({ min: -5e-4, max: 5e-4, noNaN: true }),
      depth: fc.double({ min: 1e-6, max: 0.05, noNaN: true }),
      deltaT: fc.double({ min: -50, max: 50, noNaN: true }),
      heatTransfer: fc.double({ min: 0, max: 1e4, noNaN: true }),
      gravity: fc.double({ min: 0, max: 20, noNaN: true }),
    });
    fc.assert(
      fc.property(layer, (l) => {
        const r = evaluateLayer(l, { maxDepth: 1 });
        expect(Number.isNaN(r.margin)).toBe(false);
        expect(r.margin).toBeLessThanOrEqual(r.cellMargin);
        expect(Number.isNaN(r.maxDeltaT.mostDangerous)).toBe(false);
      }),
      { numRuns: 25 },
    );
  }, 120_000);
  it('with no temperature drop there is no depth bound (no onset at any depth)', () => {
    expect(maxStableDepth({ ...marangoniLayer, deltaT: 0 })).toMatchObject({ found: false, reason: 'quiet-throughout-range' });
  });
});
