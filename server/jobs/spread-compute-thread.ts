import { Worker } from 'node:worker_threads';
import type { SpreadPlan } from '../../shared/physics/spread/spread-types';
import type { PhysicalLayer } from '../../shared/physics/sizing/types';
import type { SpreadCompute, SpreadEvaluatorInfo } from './spread-compute';

/** Rebuilds an error sent from the thread, keeping RangeError (a refused input) recognisable. */
function rebuild(error: { name: string; message: string }): Error {
  const rebuilt = error.name === 'RangeError' ? new RangeError(error.message) : new Error(error.message);
  rebuilt.name = error.name;
  return rebuilt;
}

/**
 * Computes a spread in a worker thread (server/jobs/spread-chunk-worker.ts), so the web server keeps
 * answering while a long run samples. Resolves once the thread has built the evaluator.
 */
export function openThreadSpreadCompute(plan: SpreadPlan, layer: PhysicalLayer): Promise<SpreadCompute> {
  const worker = new Worker(new URL('./spread-chunk-worker-boot.mjs', import.meta.url), { workerData: { plan, layer } });
  const pending = new Map<number, { resolve: (value: never) => void; reject: (error: Error) => void }>();
  let nextId = 1;
  let closed = false;
  const failAll = (error: Error) => {
    for (const p of pending.values()) p.reject(error);
    pending.clear();
  };
  worker.on('error', (error) => failAll(error));
  worker.on('exit', (code) => {
    if (!closed) failAll(new Error(`spread worker thread stopped (exit code ${code})`));
  });
  const ask = <T>(message: Record<string, unknown>): Promise<T> =>
    new Promise<T>((resolve, reject) => {
      const id = nextId++;
      pending.set(id, { resolve: resolve as (value: never) => void, reject });
      worker.postMessage({ ...message, id });
    });

  return new Promise((resolve, reject) => {
    const onStartError = (error: Error) => reject(error);
    worker.once('error', onStartError);
    worker.on('message', (message: { type: string; id?: number; value?: unknown; error?: { name: string; message: string }; evaluator?: SpreadEvaluatorInfo }) => {
      if (message.type === 'ready') {
        worker.off('error', onStartError);
        resolve({
          evaluator: message.evaluator as SpreadEvaluatorInfo,
          runChunk: (start, count) => ask({ type: 'chunk', start, count }),
          result: (merged) => ask({ type: 'result', merged }),
          close: async () => {
            closed = true;
            await worker.terminate();
          },
        });
      } else if (message.type === 'failed') {
        closed = true;
        void worker.terminate();
        reject(rebuild(message.error!));
      } else if (message.type === 'answer') {
        const waiting = pending.get(message.id!);
        pending.delete(message.id!);
        if (!waiting) return;
        if (message.error) waiting.reject(rebuild(message.error));
        else waiting.resolve(message.value as never);
      }
    });
  });
}
