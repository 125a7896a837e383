import { flatCellularMinimum } from '../stability/cellular-margin';
import { longWaveMargin as longWaveMarginOf } from '../stability/long-wave-margin';
import { onsetMargin } from '../stability/onset-margin';
import { validateProblem } from '../stability/validate-problem';
import type { OnsetResult } from '../stability/types';
import { layerGroups } from './layer-groups';
import { layerStabilityProblem } from './layer-stability-problem';
import type { PhysicalLayer } from './types';

/** Onset results of one layer at trial depths, solved once each and shared between depth searches. */
export interface LayerDepthOnsets {
  /** The validated layer whose depth is varied (every other field held). */
  readonly layer: PhysicalLayer;
  /** Onset result at `depth` [m], flat surface or (on a 'surface' top) deformable; solved at most once per depth and kind. */
  readonly solve: (depth: number, options: { deformable: boolean }) => OnsetResult;
  /**
   * Flat-surface cellular margin alone at `depth` [m] (OnsetResult.cellMargin) [-]: taken from a full
   * solve at that depth when there is one, else solved by itself (the largest-quiet-depth search).
   */
  readonly cellMargin: (depth: number) => number;
  /**
   * Long-wave margin alone at `depth` [m] (OnsetResult.longWaveMargin of the deformable problem) [-];
   * Infinity unless the top is a 'surface'. From a full deformable solve when there is one.
   */
  readonly longWaveMargin: (depth: number) => number;
  /** Number of solves done so far, full and single-mode (for profiling and benchmarks). */
  readonly solveCount: () => number;
}

/**
 * Onset results of a layer at trial depths, memoised and warm-started from the nearest solved depth.
 *
 * ## Method
 * At each trial depth the whole problem is rebuilt from the properties (Ra ∝ d³, Ma ∝ d, Bi ∝ d,
 * Cr ∝ 1/d, Bo ∝ d²). A depth already solved for the same problem is returned from memory (a root
 * finder re-evaluates its bracket ends, and several depth searches start from the layer's own depth).
 * A flat and a deformable problem are the same problem unless the top is a 'surface', so they share
 * one entry there. A new depth starts the solver's wavenumber search at the flat cellular k_c of the
 * solved depth nearest in ln d, because k_c moves slowly with depth (it depends on d only through Bi,
 * Cr and Bo and the Ra/Ma mix); the hint only seeds the search, and the solver falls back to a full
 * scan, so the answer matches a cold solve to 1e-6 relative.
 *
 * A depth search needs one number per depth, not the whole OnsetResult: the largest quiet depth
 * follows the flat cellular margin, the smallest the long-wave margin. `cellMargin` and
 * `longWaveMargin` solve only that mode (flatCellularMinimum: one wavenumber search instead of
 * three plus the buoyancy share; longWaveMargin: two λ evaluations instead of about twenty) and give
 * the same value as the full solve, which they reuse when it exists at that depth.
 *
 * ## References
 * - Pearson J. R. A. (1958) J. Fluid Mech. 4, 489–500 (k_c ≈ 2 across Bi: a slowly varying minimum).
 * - Nield D. A. (1964) J. Fluid Mech. 19, 341–352 (k_c between 2 and 3.1 across the Ra/Ma mix).
 *
 * @param layer - validated physical layer (SI); its depth is replaced by each trial depth
 * @returns {@link LayerDepthOnsets} for this layer
 * @example createLayerDepthOnsets(layer).solve(1e-3, { deformable: false }).cellMargin
 */
export function createLayerDepthOnsets(layer: PhysicalLayer): LayerDepthOnsets {
  const solved = new Map<string, OnsetResult>();
  const hints: { logDepth: number; wavenumber: number }[] = [];
  let count = 0;
  const nearestHint = (logDepth: number): number | undefined => {
    let best: number | undefined;
    let distance = Infinity;
    for (const hint of hints) {
      const gap = Math.abs(hint.logDepth - logDepth);
      if (gap < distance) {
        distance = gap;
        best = hint.wavenumber;
      }
    }
    return best;
  };
  const remember = (logDepth: number, cellWavenumber: number) => {
    // NaN or 0 (no cellular minimum) would be refused as a hint: leave such depths out.
    if (Number.isFinite(cellWavenumber) && cellWavenumber > 0) hints.push({ logDepth, wavenumber: cellWavenumber });
  };
  const problemAt = (depth: number, deformable: boolean) => {
    const atDepth = { ...layer, depth };
    return layerStabilityProblem(atDepth, layerGroups(atDepth), { deformable });
  };
  const solve = (depth: number, options: { deformable: boolean }): OnsetResult => {
    const deformable = options.deformable && layer.top === 'surface';
    const key = `${deformable ? 'd' : 'f'}${depth}`;
    const known = solved.get(key);
    if (known) return known;
    const logDepth = Math.log(depth);
    const wavenumberHint = nearestHint(logDepth);
    const result = onsetMargin(problemAt(depth, deformable), wavenumberHint === undefined ? {} : { wavenumberHint });
    count += 1;
    solved.set(key, result);
    remember(logDepth, result.cellWavenumber);
    return result;
  };
  const cells = new Map<number, number>();
  const cellMargin = (depth: number): number => {
    const full = solved.get(`f${depth}`) ?? solved.get(`d${depth}`);
    if (full) return full.cellMargin;
    const known = cells.get(depth);
    if (known !== undefined) return known;
    const logDepth = Math.log(depth);
    const cell = flatCellularMinimum(validateProblem(problemAt(depth, false)), nearestHint(logDepth));
    count += 1;
    cells.set(depth, cell.factor);
    remember(logDepth, Number.isFinite(cell.factor) ? cell.wavenumber : NaN);
    return cell.factor;
  };
  const longWaves = new Map<number, number>();
  const longWaveMargin = (depth: number): number => {
    if (layer.top !== 'surface') return Infinity;
    const full = solved.get(`d${depth}`);
    if (full) return full.longWaveMargin;
    const known = longWaves.get(depth);
    if (known !== undefined) return known;
    const margin = longWaveMarginOf(validateProblem(problemAt(depth, true)));
    count += 1;
    longWaves.set(depth, margin);
    return margin;
  };
  return Object.freeze({ layer, solve, cellMargin, longWaveMargin, solveCount: () => count });
}
