import { findDepthCrossing } from './find-depth-crossing';
import type { createLayerDepthOnsets } from './layer-depth-onsets';
import { sharedDepthOnsets } from './shared-depth-onsets';
import type { DepthBound, DepthSearchOptions, PhysicalLayer } from './types';
import { validatePhysicalLayer } from './validate-physical-layer';

/**
 * Largest depth before flat-surface cells set in, with ΔT and all properties held.
 *
 * ## Method
 * At each trial depth the whole problem is rebuilt from the properties (Ra ∝ d³, Ma ∝ d, Bi ∝ d all
 * move together) and the flat cellular margin λ*_cell(d) is taken from the onset solver; the depth
 * where λ*_cell = 1 is bracketed outward from the layer's own depth and refined by Brent's method
 * ({@link findDepthCrossing}). For pure buoyancy this is d = (Ra_c νκ/(gβΔT))^(1/3); for pure
 * thermocapillarity with Bi = 0, d = Ma_c μκ/(|dσ/dT|ΔT). With ΔT = 0 (or a stabilising ΔT) there is
 * no onset at any depth and the answer is 'quiet-throughout-range'.
 *
 * Solved depths are shared through `options.depthOnsets` and warm-started from the nearest solved
 * depth ({@link createLayerDepthOnsets}); the root is found to 1e-5 relative on the depth.
 *
 * ## References
 * - Chandrasekhar S. (1961) "Hydrodynamic and Hydromagnetic Stability", Oxford, ch. II.
 * - Pearson J. R. A. (1958) J. Fluid Mech. 4, 489–500. doi:10.1017/S0022112058000616
 * - Brent R. P. (1973) "Algorithms for Minimization without Derivatives", ch. 4.
 *
 * @param layer - physical layer (SI)
 * @param options - search range, default 1e-7–10 m; `depthOnsets` to share solves with other searches
 * @returns frozen {@link DepthBound}: the depth [m], or why there is none in the range
 * @throws RangeError naming the field when the layer is invalid
 * @example maxStableDepth(layer) // { found: true, depth: 0.0021 } for a 10 K silicone-oil layer
 */
export function maxStableDepth(layer: PhysicalLayer, options: DepthSearchOptions = {}): DepthBound {
  const checked = validatePhysicalLayer(layer);
  const onsets = sharedDepthOnsets(checked, options.depthOnsets);
  return findDepthCrossing({
    margin: (depth) => onsets.cellMargin(depth),
    startDepth: checked.depth,
    minDepth: options.minDepth ?? 1e-7,
    maxDepth: options.maxDepth ?? 10,
    quietSide: 'below',
    stepPower: 3,
    modeName: 'cells',
  });
}
