import { layerGroups } from '../sizing/layer-groups';
import { layerStabilityProblem } from '../sizing/layer-stability-problem';
import type { PhysicalLayer } from '../sizing/types';
import { validatePhysicalLayer } from '../sizing/validate-physical-layer';
import { onsetMargin } from '../stability/onset-margin';
import type { SpreadEvaluator } from './spread-types';

/** Numeric fields of a physical layer that a Property spread may vary. */
export const LAYER_SPREAD_FIELDS = Object.freeze([
  'density',
  'viscosity',
  'conductivity',
  'heatCapacity',
  'expansion',
  'surfaceTension',
  'dSigmaDT',
  'depth',
  'deltaT',
  'heatTransfer',
  'gravity',
] as const);

/** One of {@link LAYER_SPREAD_FIELDS}. */
export type LayerSpreadField = (typeof LAYER_SPREAD_FIELDS)[number];

/**
 * Full-solver margin of a layer for one sample of its properties: the most dangerous mode's Onset
 * margin exactly as `evaluateLayer(layer).margin` reports it, without the depth and ΔT searches
 * that evaluateLayer also runs (they do not change the margin and cost ten times more).
 *
 * ## Method
 * The sampled values replace the layer's fields; validatePhysicalLayer → layerGroups →
 * layerStabilityProblem (deformable surface on a 'surface' top) → onsetMargin. A sample the layer
 * check rejects (RangeError) gives NaN, which the spread counts and leaves out.
 *
 * ## References
 * - Pearson J. R. A. (1958) J. Fluid Mech. 4:489–500. doi:10.1017/S0022112058000616
 * - Nield D. A. (1964) J. Fluid Mech. 19:341–352. doi:10.1017/S0022112064000763
 *
 * @param layer - nominal physical layer (SI); its boundary kinds are kept for every sample
 * @returns evaluator from sampled field values to the Onset margin [×]
 * @example layerMarginEvaluator(layer)({ viscosity: 0.006 }, 0) // margin with μ = 6 mPa·s
 */
export function layerMarginEvaluator(layer: PhysicalLayer): SpreadEvaluator {
  return (sample) => {
    try {
      const checked = validatePhysicalLayer({ ...layer, ...sample });
      return onsetMargin(layerStabilityProblem(checked, layerGroups(checked), { deformable: true })).margin;
    } catch (error) {
      if (error instanceof RangeError) return Number.NaN;
      throw error;
    }
  };
}
