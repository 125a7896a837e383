import { findDepthCrossing } from './find-depth-crossing';
import type { createLayerDepthOnsets } from './layer-depth-onsets';
import { sharedDepthOnsets } from './shared-depth-onsets';
import type { DepthBound, DepthSearchOptions, PhysicalLayer } from './types';
import { validatePhysicalLayer } from './validate-physical-layer';

/**
 * Smallest depth before the long-wave deformational mode thins the film into dry spots, with ΔT and
 * all properties held (deformable free surface only).
 *
 * ## Method
 * At each trial depth the problem is rebuilt from the properties, including the crispation
 * (Cr ∝ 1/d) and Bond (Bo ∝ d²) numbers, and the long-wave margin λ*_LW(d) is taken from the onset
 * solver. For a rigid conducting bottom and Ra = 0, λ*_LW = (2/3)Ga(1 + Bi)/Ma ∝ d²(1 + Bi), so it
 * rises with depth: thin films are the ones that thin. The depth where λ*_LW = 1 is bracketed from
 * the layer's own depth and refined by Brent's method ({@link findDepthCrossing}).
 *
 * Solved depths are shared through `options.depthOnsets` and warm-started from the nearest solved
 * depth ({@link createLayerDepthOnsets}); the root is found to 1e-5 relative on the depth.
 *
 * ## References
 * - VanHook S. J. et al. (1997) J. Fluid Mech. 345, 45–78. doi:10.1017/S0022112097006101
 * - Davis S. H. (1987) Annu. Rev. Fluid Mech. 19, 403–435. doi:10.1146/annurev.fl.19.010187.002155
 *
 * @param layer - physical layer (SI)
 * @param options - search range, default 1e-7–10 m; `depthOnsets` to share solves with other searches
 * @returns frozen {@link DepthBound}; 'not-applicable' unless the top is 'surface'
 * @throws RangeError naming the field when the layer is invalid
 * @example minStableDepth(layer) // { found: true, depth: 1.2e-4 } for a thin oil film heated by 10 K
 */
export function minStableDepth(layer: PhysicalLayer, options: DepthSearchOptions = {}): DepthBound {
  const checked = validatePhysicalLayer(layer);
  if (checked.top !== 'surface') {
    return Object.freeze({
      found: false,
      reason: 'not-applicable',
      searchedFrom: NaN,
      searchedTo: NaN,
      message: 'Only a free surface can deform, so there is no long-wave thinning limit for this top.',
    } as const);
  }
  const onsets = sharedDepthOnsets(checked, options.depthOnsets);
  return findDepthCrossing({
    margin: (depth) => onsets.longWaveMargin(depth),
    startDepth: checked.depth,
    minDepth: options.minDepth ?? 1e-7,
    maxDepth: options.maxDepth ?? 10,
    quietSide: 'above',
    stepPower: 2,
    modeName: 'long-wave thinning',
  });
}
