import { createLayerDepthOnsets, type LayerDepthOnsets } from './layer-depth-onsets';
import type { PhysicalLayer } from './types';

/**
 * The solved depths a depth search should use: the caller's set when it was made for this very layer
 * (every field equal, depth included), otherwise a fresh one, so a mismatched set can never leak
 * another layer's answers into this one.
 *
 * ## Method
 * Field-by-field comparison of the two validated layers; see {@link createLayerDepthOnsets}.
 *
 * ## References
 * - Press W. H. et al. (2007) "Numerical Recipes", 3rd ed., §9.1 (reusing function values between
 *   bracketing and refinement).
 *
 * @param layer - validated physical layer (SI)
 * @param candidate - a caller's set of solved depths, if any
 * @returns the set to use
 * @example sharedDepthOnsets(layer, undefined).solveCount() // 0
 */
export function sharedDepthOnsets(layer: PhysicalLayer, candidate: LayerDepthOnsets | undefined): LayerDepthOnsets {
  if (candidate !== undefined && sameLayer(candidate.layer, layer)) return candidate;
  return createLayerDepthOnsets(layer);
}

function sameLayer(a: PhysicalLayer, b: PhysicalLayer): boolean {
  const keys = Object.keys(a) as (keyof PhysicalLayer)[];
  return keys.length === Object.keys(b).length && keys.every((key) => Object.is(a[key], b[key]));
}
