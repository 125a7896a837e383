import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { onsetCaseResultSchema, type OnsetCaseResult } from '../../../../shared/schemas/onset';
import { api } from '../../../lib/api-client';

const batchAnswerSchema = z.object({ results: z.array(onsetCaseResultSchema) });

/** Cases per request: well under the server's 10,000-case and 1 MB limits, and a progress step. */
export const BATCH_CHUNK = 500;

export function evaluateBatchChunk(cases: Record<string, unknown>[]) {
  return api.post('/batch/evaluate', { cases }, { schema: batchAnswerSchema }).then((answer) => answer.results);
}

/** Sends the cases in chunks, one after another, reporting how many are done after each. */
export async function evaluateBatch(cases: Record<string, unknown>[], onProgress: (done: number) => void): Promise<OnsetCaseResult[]> {
  const results: OnsetCaseResult[] = [];
  for (let start = 0; start < cases.length; start += BATCH_CHUNK) {
    results.push(...(await evaluateBatchChunk(cases.slice(start, start + BATCH_CHUNK))));
    onProgress(results.length);
  }
  return results;
}

export const useEvaluateBatch = () =>
  useMutation({ mutationFn: ({ cases, onProgress }: { cases: Record<string, unknown>[]; onProgress: (done: number) => void }) => evaluateBatch(cases, onProgress) });
