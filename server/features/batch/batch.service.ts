import { setImmediate as nextTurn } from 'node:timers/promises';
import { evaluateCase } from '../../../shared/physics/batch/evaluate-case';
import { BATCH_MAX_CASES, BATCH_WORKER_THRESHOLD } from '../../../shared/schemas/batch';
import type { OnsetCaseResult } from '../../../shared/schemas/onset';
import { AppError } from '../../errors';
import { runCasesInWorker } from './run-cases-in-worker';

export class PayloadTooLargeError extends AppError {
  constructor(message: string) {
    super(413, 'payload_too_large', message);
  }
}

/**
 * Evaluates onset cases with the shared row evaluation (the same as `npm run onset`). Small batches
 * run here, yielding to the event loop between cases; larger ones in a worker thread.
 */
export async function evaluateBatch(cases: unknown[]): Promise<OnsetCaseResult[]> {
  if (cases.length > BATCH_MAX_CASES) {
    throw new PayloadTooLargeError(
      `This batch has ${cases.length} cases; at most ${BATCH_MAX_CASES.toLocaleString('en')} per request. Split the file and send the parts one after another.`,
    );
  }
  if (cases.length > BATCH_WORKER_THRESHOLD) return runCasesInWorker(cases);
  const results: OnsetCaseResult[] = [];
  for (const c of cases) {
    results.push(evaluateCase(c));
    await nextTurn();
  }
  return results;
}
