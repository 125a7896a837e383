import { describe, expect, it } from 'vitest';
import { onsetMargin } from '../stability/onset-margin';
import { createLayerDepthOnsets } from './layer-depth-onsets';
import { layerGroups } from './layer-groups';
import { layerStabilityProblem } from './layer-stability-problem';
import type { PhysicalLayer } from './types';

// A solvent-borne coat on a steel plate: round property values of the kind a coatings data sheet gives
// (common practice), not one product's.
const coat: PhysicalLayer = {
  bottom: 'rigid', bottomThermal: 'conducting', top: 'surface',
  density: 900, viscosity: 0.01, conductivity: 0.15, heatCapacity: 1900, expansion: 1e-3,
  surfaceTension: 0.025, dSigmaDT: -1e-4, depth: 5e-4, deltaT: 5, heatTransfer: 30, gravity: 9.80665,
};
const relative = (a: number, b: number) => Math.abs(a / b - 1);
const cold = (depth: number, deformable: boolean) => {
  const atDepth = { ...coat, depth };
  return onsetMargin(layerStabilityProblem(atDepth, layerGroups(atDepth), { deformable }));
};

describe('createLayerDepthOnsets: single-mode margins for the depth searches', () => {
  it('cellMargin and longWaveMargin match a cold full solve at depths never solved in full', () => {
    const onsets = createLayerDepthOnsets(coat);
    for (const depth of [3e-5, 2e-4, 1.3e-3, 6e-3]) {
      expect(relative(onsets.cellMargin(depth), cold(depth, false).cellMargin)).toBeLessThan(1e-6);
      expect(relative(onsets.longWaveMargin(depth), cold(depth, true).longWaveMargin)).toBeLessThan(1e-9);
    }
  });

  it('reuses a full solve at the same depth and solves each single mode once per depth', () => {
    const onsets = createLayerDepthOnsets(coat);
    const full = onsets.solve(coat.depth, { deformable: true });
    expect(onsets.solveCount()).toBe(1);
    expect(onsets.cellMargin(coat.depth)).toBe(full.cellMargin);
    expect(onsets.longWaveMargin(coat.depth)).toBe(full.longWaveMargin);
    expect(onsets.solveCount()).toBe(1);
    onsets.cellMargin(1e-3);
    onsets.cellMargin(1e-3);
    onsets.longWaveMargin(1e-5);
    onsets.longWaveMargin(1e-5);
    expect(onsets.solveCount()).toBe(3);
  });

  it('a rigid top has no long-wave mode', () => {
    const onsets = createLayerDepthOnsets({ ...coat, top: 'rigid' });
    expect(onsets.longWaveMargin(1e-3)).toBe(Infinity);
    expect(onsets.solveCount()).toBe(0);
  });
});
