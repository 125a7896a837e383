import { Worker } from 'node:worker_threads';
import type { OnsetCaseResult } from '../../../shared/schemas/onset';

const evaluateCaseModule = new URL('../../../shared/physics/batch/evaluate-case.ts', import.meta.url).href;

// The worker loads the TypeScript module through tsx (the project runs on tsx; Node 20 does not
// strip types), evaluates every case and posts the results back.
const WORKER_SOURCE = `
const { parentPort, workerData } = require('node:worker_threads');
(async () => {
  const { register } = await import('tsx/esm/api');
  register();
  const { evaluateCase } = await import(workerData.module);
  parentPort.postMessage(workerData.cases.map((c) => evaluateCase(c)));
})().catch((error) => { throw error; });
`;

/**
 * Evaluates batch cases in a worker thread so the server's event loop stays free.
 * Each case gets its own result (errors included), in order.
 */
export function runCasesInWorker(cases: unknown[]): Promise<OnsetCaseResult[]> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(WORKER_SOURCE, { eval: true, workerData: { module: evaluateCaseModule, cases } });
    worker.once('message', (results: OnsetCaseResult[]) => {
      resolve(results);
      void worker.terminate();
    });
    worker.once('error', reject);
    worker.once('exit', (code) => {
      if (code !== 0) reject(new Error(`batch worker stopped with exit code ${code}`));
    });
  });
}
