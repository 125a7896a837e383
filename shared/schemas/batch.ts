import { z } from 'zod';
import { onsetCaseResultSchema } from './onset';

/**
 * POST /api/batch/evaluate (engineers): the `onset` command over HTTP.
 *
 * Body: either a bare JSON array of cases or `{ cases: [...] }` (shared/schemas/onset.ts), each case
 * in exactly the onset command's input fields (SI). Answer: the results in the onset command's output
 * fields, one per case in order — a bare array for a bare array, `{ results }` for `{ cases }`.
 * A bad case never fails the request: its result carries `error`. More than
 * {@link BATCH_MAX_CASES} cases, or a body over the server's JSON limit (1 MB), is refused with 413.
 * Batches of more than {@link BATCH_WORKER_THRESHOLD} cases run in a worker thread.
 */
export const BATCH_MAX_CASES = 10_000;
export const BATCH_WORKER_THRESHOLD = 50;

export const batchCasesBodySchema = z.union([
  z.array(z.unknown(), { error: 'the body must be a JSON array of cases or { "cases": [...] }' }),
  z.object({ cases: z.array(z.unknown()) }),
]);
export const batchResultsSchema = z.array(onsetCaseResultSchema);
