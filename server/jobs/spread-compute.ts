import type { SpreadChunk, SpreadPlan } from '../../shared/physics/spread/spread-types';
import type { PhysicalLayer } from '../../shared/physics/sizing/types';
import type { SpreadRunResult } from '../../shared/schemas/property-spreads';

/** Which evaluator a spread uses and why (JSON-safe). */
export interface SpreadEvaluatorInfo {
  method: 'surrogate' | 'solver';
  surrogate: unknown;
  fallbackReason: string | null;
}

/**
 * Where a spread's samples are computed: in this thread, or in a worker thread so a long run never
 * holds up the web server's requests. Both give identical numbers (same plan, same evaluator).
 */
export interface SpreadCompute {
  readonly evaluator: SpreadEvaluatorInfo;
  runChunk(start: number, count: number): Promise<SpreadChunk>;
  /** Summary, swings and evaluator of merged tallies starting at sample 0. */
  result(merged: SpreadChunk): Promise<SpreadRunResult>;
  close(): Promise<void>;
}

export type OpenSpreadCompute = (plan: SpreadPlan, layer: PhysicalLayer) => Promise<SpreadCompute>;
