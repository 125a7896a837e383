import { createLayerSpreadEvaluator } from '../../shared/physics/spread/create-layer-spread-evaluator';
import { runSpreadChunk } from '../../shared/physics/spread/run-spread-chunk';
import type { SpreadPlan } from '../../shared/physics/spread/spread-types';
import type { PhysicalLayer } from '../../shared/physics/sizing/types';
import { spreadRunResult } from '../features/property-spreads/spread-run-result';
import type { SpreadCompute } from './spread-compute';

/** Computes a spread in the calling thread (tests, small runs, and the worker thread itself). */
export function openInlineSpreadCompute(plan: SpreadPlan, layer: PhysicalLayer): SpreadCompute {
  const chosen = createLayerSpreadEvaluator(layer, plan.properties, { seed: plan.seed });
  return {
    evaluator: JSON.parse(JSON.stringify({ method: chosen.method, surrogate: chosen.surrogate, fallbackReason: chosen.fallbackReason })),
    runChunk: async (start, count) => runSpreadChunk(plan, { start, count }, chosen.evaluate),
    result: async (merged) => JSON.parse(JSON.stringify(spreadRunResult(plan, merged, chosen))),
    close: async () => {},
  };
}
