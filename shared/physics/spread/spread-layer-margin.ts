import type { PhysicalLayer } from '../sizing/types';
import { createLayerSpreadEvaluator, type LayerSpreadEvaluator } from './create-layer-spread-evaluator';
import { createLayerSpreadPlan, type LayerSpreadOptions } from './create-layer-spread-plan';
import { marginSwingPerProperty } from './margin-swing-per-property';
import { runSpreadChunk } from './run-spread-chunk';
import type { SpreadPropertySpec, SpreadResult, SpreadSwing } from './spread-types';
import { summarizeSpread } from './summarize-spread';

/**
 * Property spread of a layer's Onset margin: seeded Monte Carlo over the stated uncertainties of
 * its properties (and, if wanted, depth, ΔT or heat-transfer coefficient), with probability of
 * onset, margin percentiles, rank-correlation sensitivity and one-at-a-time swings.
 *
 * ## Method
 * The plan's base holds every numeric field of the layer; the listed fields are sampled (normal:
 * ± u as 1σ; uniform: ± u as half-width). The margin is the most dangerous mode's λ* from the
 * linear stability solver (as `evaluateLayer(...).margin`), through a validated response surface
 * unless `method: 'solver'` (see `createLayerSpreadEvaluator`). For job-queue runs, build the same
 * plan with `createLayerSpreadPlan`, the evaluator with `createLayerSpreadEvaluator` (same seed →
 * same surrogate in every worker), and use `runSpreadChunk` / `mergeSpreadChunks` /
 * `summarizeSpread`.
 *
 * ## References
 * - Saltelli A. et al. (2008) "Global Sensitivity Analysis: The Primer", Wiley.
 *   doi:10.1002/9780470725184
 * - Pearson J. R. A. (1958) J. Fluid Mech. 4:489–500. doi:10.1017/S0022112058000616
 *
 * @param layer - nominal physical layer (SI)
 * @param uncertainties - fields to vary, each from LAYER_SPREAD_FIELDS
 * @param options - samples, seed, evaluator method
 * @returns spread summary, swings, and which evaluator was used with its validation
 * @example spreadLayerMargin(layer, [{ name: 'viscosity', relativeUncertainty: 0.1,
 *   distribution: 'normal' }], { samples: 10000, seed: 1 }).onsetProbability
 */
export function spreadLayerMargin(
  layer: PhysicalLayer,
  uncertainties: readonly SpreadPropertySpec[],
  options: LayerSpreadOptions,
): SpreadResult & {
  readonly swing: readonly SpreadSwing[];
  readonly method: LayerSpreadEvaluator['method'];
  readonly surrogate: LayerSpreadEvaluator['surrogate'];
  readonly fallbackReason: string | null;
} {
  const plan = createLayerSpreadPlan(layer, uncertainties, options);
  const chosen = createLayerSpreadEvaluator(layer, plan.properties, options);
  const chunk = runSpreadChunk(plan, { start: 0, count: plan.samples }, chosen.evaluate);
  const swing = marginSwingPerProperty(plan.base, plan.properties, chosen.evaluate);
  return Object.freeze({
    ...summarizeSpread(plan, chunk),
    swing,
    method: chosen.method,
    surrogate: chosen.surrogate,
    fallbackReason: chosen.fallbackReason,
  });
}
