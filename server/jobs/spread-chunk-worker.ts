import { parentPort, workerData } from 'node:worker_threads';
import type { SpreadChunk, SpreadPlan } from '../../shared/physics/spread/spread-types';
import type { PhysicalLayer } from '../../shared/physics/sizing/types';
import { openInlineSpreadCompute } from './spread-compute-inline';

/**
 * Worker thread of one Property spread: builds the evaluator once (deterministic in the seed), then
 * answers chunk and result requests from the job worker. Errors are sent back, never thrown away.
 */
const { plan, layer } = workerData as { plan: SpreadPlan; layer: PhysicalLayer };
const port = parentPort!;
try {
  const compute = openInlineSpreadCompute(plan, layer);
  port.postMessage({ type: 'ready', evaluator: compute.evaluator });
  port.on('message', async (message: { id: number; type: 'chunk'; start: number; count: number } | { id: number; type: 'result'; merged: SpreadChunk }) => {
    try {
      const value = message.type === 'chunk' ? await compute.runChunk(message.start, message.count) : await compute.result(message.merged);
      port.postMessage({ type: 'answer', id: message.id, value });
    } catch (error) {
      port.postMessage({ type: 'answer', id: message.id, error: { name: (error as Error).name, message: (error as Error).message } });
    }
  });
} catch (error) {
  port.postMessage({ type: 'failed', error: { name: (error as Error).name, message: (error as Error).message } });
}
