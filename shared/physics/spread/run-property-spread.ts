import { createSpreadPlan } from './create-spread-plan';
import { marginSwingPerProperty } from './margin-swing-per-property';
import { runSpreadChunk } from './run-spread-chunk';
import type { SpreadEvaluator, SpreadOptions, SpreadResult, SpreadSwing } from './spread-types';
import { summarizeSpread } from './summarize-spread';

/**
 * A whole Property spread in one call (the inline path for runs of up to ~10 000 samples):
 * seeded Monte Carlo over each property's stated uncertainty, giving the probability of onset,
 * margin percentiles, rank-correlation sensitivity and the one-at-a-time swing.
 *
 * ## Method
 * `createSpreadPlan` → `runSpreadChunk` over every sample → `summarizeSpread`, plus
 * `marginSwingPerProperty` at ±1 stated uncertainty. The result is identical to running the same
 * plan in chunks and merging them.
 *
 * ## References
 * - Saltelli A. et al. (2008) "Global Sensitivity Analysis: The Primer", Wiley.
 *   doi:10.1002/9780470725184
 * - Blackman D., Vigna S. (2021) ACM Trans. Math. Softw. 47(4):36. doi:10.1145/3460772
 *
 * @param options - base values, uncertain properties, samples and seed, plus the evaluator
 * @returns the summary and the swings [-]
 * @example runPropertySpread({ base: { x: 1.25 }, properties: [{ name: 'x', relativeUncertainty: 0.2,
 *   distribution: 'normal' }], samples: 10000, seed: 1, evaluate: (s) => s.x }).onsetProbability // ≈ 0.159
 */
export function runPropertySpread(
  options: SpreadOptions & { readonly evaluate: SpreadEvaluator },
): SpreadResult & { readonly swing: readonly SpreadSwing[] } {
  const plan = createSpreadPlan(options);
  const chunk = runSpreadChunk(plan, { start: 0, count: plan.samples }, options.evaluate);
  const summary = summarizeSpread(plan, chunk);
  const swing = marginSwingPerProperty(plan.base, plan.properties, options.evaluate);
  return Object.freeze({ ...summary, swing });
}
