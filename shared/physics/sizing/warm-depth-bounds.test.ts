import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { onsetMargin } from '../stability/onset-margin';
import { evaluateLayer } from './evaluate-layer';
import { layerGroups } from './layer-groups';
import { layerStabilityProblem } from './layer-stability-problem';
import type { PhysicalLayer } from './types';

/**
 * The shared, warm-started depth searches in evaluateLayer must give the depth bounds of a plain cold
 * search. The reference here is written independently of the sizing code: every depth is solved cold
 * (onsetMargin with no wavenumber hint), the crossing is bracketed by doubling/halving the depth from
 * the layer's own depth, and refined by plain bisection in ln d to 1e-9
 * (Press W. H. et al. (2007) "Numerical Recipes", 3rd ed., §9.1: bracketing and bisection).
 * Allowed difference: 1e-4 relative, well inside what is shown (4 significant digits) and the
 * reference checks in sizing.test.ts (2e-5 from the solver plus the search) are kept separately.
 */
const rel = (a: number, b: number) => Math.abs(a / b - 1);

function coldCrossing(
  layer: PhysicalLayer,
  lnMargin: (layer: PhysicalLayer) => number,
  quietSide: 'below' | 'above',
): number | null {
  const g = (lnDepth: number) => lnMargin({ ...layer, depth: Math.exp(lnDepth) });
  const towardOnset = quietSide === 'below' ? 1 : -1;
  let x = Math.log(layer.depth);
  let value = g(x);
  const direction = value >= 0 ? towardOnset : -towardOnset;
  for (let step = 0; step < 60; step += 1) {
    const next = x + direction * Math.LN2;
    if (next > Math.log(10) || next < Math.log(1e-7)) return null;
    const nextValue = g(next);
    if ((nextValue >= 0) !== (value >= 0)) {
      let lo = Math.min(x, next);
      let hi = Math.max(x, next);
      const gLo = g(lo);
      while (hi - lo > 1e-9) {
        const mid = (lo + hi) / 2;
        if ((g(mid) >= 0) === (gLo >= 0)) lo = mid;
        else hi = mid;
      }
      return Math.exp((lo + hi) / 2);
    }
    x = next;
    value = nextValue;
  }
  return null;
}

const coldCellMargin = (layer: PhysicalLayer) =>
  Math.log(onsetMargin(layerStabilityProblem(layer, layerGroups(layer), { deformable: false })).cellMargin);
const coldLongWaveMargin = (layer: PhysicalLayer) =>
  Math.log(onsetMargin(layerStabilityProblem(layer, layerGroups(layer), { deformable: true })).longWaveMargin);

describe('evaluateLayer: warm-started, shared depth searches match a cold bisection', () => {
  it('property: maxStableDepth and minStableDepth equal the cold bounds within 1e-4 relative', () => {
    // Coating-like liquids heated from below (buoyancy and thermocapillarity both destabilising), so
    // each margin is monotone in depth and has one crossing: the ranges are common practice for
    // solvent-borne films and oils, not taken from one table.
    const layer = fc.record({
      bottom: fc.constantFrom('rigid' as const, 'free' as const),
      bottomThermal: fc.constantFrom('conducting' as const, 'insulating' as const),
      top: fc.constantFrom('rigid' as const, 'surface' as const),
      density: fc.double({ min: 700, max: 1500, noNaN: true }),
      viscosity: fc.double({ min: 1e-3, max: 0.5, noNaN: true }),
      conductivity: fc.double({ min: 0.08, max: 0.6, noNaN: true }),
      heatCapacity: fc.double({ min: 1200, max: 4200, noNaN: true }),
      expansion: fc.double({ min: 2e-4, max: 1.5e-3, noNaN: true }),
      surfaceTension: fc.double({ min: 0.015, max: 0.07, noNaN: true }),
      dSigmaDT: fc.double({ min: -1.5e-4, max: -2e-5, noNaN: true }),
      depth: fc.double({ min: 2e-5, max: 5e-3, noNaN: true }),
      deltaT: fc.double({ min: 0.5, max: 30, noNaN: true }),
      heatTransfer: fc.double({ min: 0, max: 100, noNaN: true }),
      gravity: fc.constant(9.80665),
    });
    fc.assert(
      fc.property(layer, (l) => {
        const result = evaluateLayer(l);
        const coldMax = coldCrossing(l, coldCellMargin, 'below');
        expect(result.maxStableDepth.found).toBe(coldMax !== null);
        if (result.maxStableDepth.found && coldMax !== null) expect(rel(result.maxStableDepth.depth, coldMax)).toBeLessThan(1e-4);
        if (l.top === 'surface') {
          const coldMin = coldCrossing(l, coldLongWaveMargin, 'above');
          expect(result.minStableDepth.found).toBe(coldMin !== null);
          if (result.minStableDepth.found && coldMin !== null) expect(rel(result.minStableDepth.depth, coldMin)).toBeLessThan(1e-4);
        }
      }),
      { numRuns: 20, seed: 20_261_202 },
    );
  }, 300_000);
});
