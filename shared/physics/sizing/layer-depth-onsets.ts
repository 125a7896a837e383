import { onsetMargin } from '../stability/onset-margin';
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
  /** Number of onset solves done so far (for profiling and benchmarks). */
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
  const solve = (depth: number, options: { deformable: boolean }): OnsetResult => {
    const deformable = options.deformable && layer.top === 'surface';
    const key = `${deformable ? 'd' : 'f'}${depth}`;
    const known = solved.get(key);
    if (known) return known;
    const atDepth = { ...layer, depth };
    const problem = layerStabilityProblem(atDepth, layerGroups(atDepth), { deformable });
    const logDepth = Math.log(depth);
    const wavenumberHint = nearestHint(logDepth);
    const result = onsetMargin(problem, wavenumberHint === undefined ? {} : { wavenumberHint });
    count += 1;
    solved.set(key, result);
    // NaN or 0 (no cellular minimum) would be refused as a hint: leave such depths out.
    if (Number.isFinite(result.cellWavenumber) && result.cellWavenumber > 0) {
      hints.push({ logDepth, wavenumber: result.cellWavenumber });
    }
    return result;
  };
  return Object.freeze({ layer, solve, solveCount: () => count });
}
