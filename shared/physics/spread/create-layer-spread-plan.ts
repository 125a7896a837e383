import type { PhysicalLayer } from '../sizing/types';
import { createSpreadPlan } from './create-spread-plan';
import { LAYER_SPREAD_FIELDS } from './layer-margin-evaluator';
import type { SpreadPlan, SpreadPropertySpec } from './spread-types';

/** Options of a layer spread (`spreadLayerMargin`, `createLayerSpreadPlan`). */
export interface LayerSpreadOptions {
  readonly samples: number;
  readonly seed: number;
  /** 'surrogate' (default): validated response surface, falling back to the solver; 'solver': full solve per sample. */
  readonly method?: 'surrogate' | 'solver';
  /** Largest accepted relative error of the surrogate at its validation points, default 0.005. */
  readonly surrogateTolerance?: number;
  readonly exactPercentileLimit?: number;
  readonly sensitivitySampleLimit?: number;
}

/**
 * The spread plan of a layer: every numeric layer field as base, the listed fields varied.
 *
 * ## Method
 * Checks each uncertainty names a numeric field of the layer, then `createSpreadPlan`.
 *
 * ## References
 * - Saltelli A. et al. (2008) "Global Sensitivity Analysis: The Primer", Wiley.
 *
 * @param layer - nominal physical layer (SI)
 * @param uncertainties - fields to vary
 * @param options - samples, seed and percentile/sensitivity limits
 * @returns a frozen plan
 * @example createLayerSpreadPlan(layer, [{ name: 'depth', relativeUncertainty: 0.02,
 *   distribution: 'uniform' }], { samples: 1e6, seed: 9 }).percentileMode // 'histogram'
 */
export function createLayerSpreadPlan(
  layer: PhysicalLayer,
  uncertainties: readonly SpreadPropertySpec[],
  options: LayerSpreadOptions,
): SpreadPlan {
  const base: Record<string, number> = {};
  for (const field of LAYER_SPREAD_FIELDS) base[field] = layer[field];
  uncertainties.forEach((u, i) => {
    if (!(LAYER_SPREAD_FIELDS as readonly string[]).includes(u.name)) {
      throw new RangeError(
        `uncertainties[${i}].name must be one of ${LAYER_SPREAD_FIELDS.join(', ')}; got "${u.name}"`,
      );
    }
  });
  return createSpreadPlan({
    base,
    properties: uncertainties,
    samples: options.samples,
    seed: options.seed,
    exactPercentileLimit: options.exactPercentileLimit,
    sensitivitySampleLimit: options.sensitivitySampleLimit,
  });
}
