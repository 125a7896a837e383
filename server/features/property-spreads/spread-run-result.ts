import type { createLayerSpreadEvaluator } from '../../../shared/physics/spread/create-layer-spread-evaluator';
import { marginSwingPerProperty } from '../../../shared/physics/spread/margin-swing-per-property';
import type { SpreadChunk, SpreadPlan } from '../../../shared/physics/spread/spread-types';
import { summarizeSpread } from '../../../shared/physics/spread/summarize-spread';
import type { SpreadRunResult } from '../../../shared/schemas/property-spreads';

/**
 * The finished figures of a run: summary of the merged tallies, the one-at-a-time swings and the
 * evaluator used. Pure apart from the evaluator it is given.
 */
export function spreadRunResult(plan: SpreadPlan, chunk: SpreadChunk, chosen: ReturnType<typeof createLayerSpreadEvaluator>): SpreadRunResult {
  return {
    ...summarizeSpread(plan, chunk),
    swing: marginSwingPerProperty(plan.base, plan.properties, chosen.evaluate),
    method: chosen.method,
    fallbackReason: chosen.fallbackReason,
  };
}
