import { setImmediate as yieldToEventLoop } from 'node:timers/promises';
import { mergeSpreadChunks } from '../../../shared/physics/spread/merge-spread-chunks';
import type { SpreadChunk, SpreadPlan } from '../../../shared/physics/spread/spread-types';
import type { PhysicalLayer } from '../../../shared/physics/sizing/types';
import type { Database } from '../../db/client';
import { advanceProgress, findChunkRanges, findChunks, findSpreadById, insertChunk, updateSpread } from './property-spreads.repository';
import type { OpenSpreadCompute, SpreadCompute } from '../../jobs/spread-compute';
import { openInlineSpreadCompute } from '../../jobs/spread-compute-inline';

/** Thrown between chunks when the worker is asked to stop; the job queue retries the job later. */
export class SpreadInterruptedError extends Error {
  constructor(spreadId: string, evaluated: number) {
    super(`property spread ${spreadId} interrupted after ${evaluated} samples; it resumes from its stored chunks`);
    this.name = 'SpreadInterruptedError';
  }
}

export interface RunQueuedSpreadOptions {
  /** Asked between chunks; true → stop (SpreadInterruptedError) so the job is retried later. */
  shouldStop?: () => boolean;
  /** Pause after each stored chunk [ms] (leaves CPU to the web server on small machines). */
  pauseBetweenChunksMs?: number;
  /** Called after each stored chunk with samples evaluated so far. */
  onProgress?: (evaluated: number, samples: number) => void;
  /** Where samples are computed (default: this thread; the job worker uses a worker thread). */
  openCompute?: OpenSpreadCompute;
}

/** End of the contiguous run of stored chunks from sample 0. */
function resumePoint(ranges: { start: number; end: number }[]): number {
  let next = 0;
  for (const range of ranges) {
    if (range.start !== next) break;
    next = range.end;
  }
  return next;
}

/**
 * Works a queued Property spread through to the end, chunk by chunk, storing each chunk and the
 * progress as it goes; a run that was interrupted (worker stopped or died) continues from its
 * stored chunks, and because every sample depends only on (seed, index) the finished result equals
 * an uninterrupted run. Safe to call twice for the same spread: a chunk already stored is kept.
 *
 * @returns the final status ('done', 'failed', or the status found when there was nothing to do)
 */
export async function runQueuedSpread(db: Database, spreadId: string, options: RunQueuedSpreadOptions = {}): Promise<'done' | 'failed' | 'missing'> {
  const row = await findSpreadById(db, spreadId);
  if (!row) return 'missing';
  if (row.status === 'done' || row.status === 'failed') return row.status;
  const plan = row.plan as SpreadPlan;
  const layer = row.layer as PhysicalLayer;

  let compute: SpreadCompute;
  try {
    compute = await (options.openCompute ?? (async (p, l) => openInlineSpreadCompute(p, l)))(plan, layer);
  } catch (error) {
    // A plan the physics refuses will not heal by retrying: fail the spread, not the job.
    if (!(error instanceof RangeError)) throw error;
    await updateSpread(db, spreadId, { status: 'failed', error: error.message, finishedAt: new Date() });
    return 'failed';
  }
  try {
    await updateSpread(db, spreadId, { status: 'running', evaluator: compute.evaluator });

    let next = resumePoint(await findChunkRanges(db, spreadId));
    while (next < plan.samples) {
      if (options.shouldStop?.()) throw new SpreadInterruptedError(spreadId, next);
      const count = Math.min(row.chunkSize, plan.samples - next);
      const chunk = await compute.runChunk(next, count);
      await db.transaction(async (tx) => {
        await insertChunk(tx, spreadId, next, next + count, chunk);
        await advanceProgress(tx, spreadId, next + count);
      });
      next += count;
      options.onProgress?.(next, plan.samples);
      if (options.pauseBetweenChunksMs) await new Promise((resolve) => setTimeout(resolve, options.pauseBetweenChunksMs));
      else await yieldToEventLoop();
    }

    const chunks = (await findChunks(db, spreadId)) as SpreadChunk[];
    const merged = mergeSpreadChunks(plan, chunks);
    if (merged.validCount === 0) {
      await updateSpread(db, spreadId, { status: 'failed', error: 'No sample could be judged: every sample left the range the solver accepts.', evaluatedSamples: plan.samples, finishedAt: new Date() });
      return 'failed';
    }
    const result = await compute.result(merged);
    await updateSpread(db, spreadId, { status: 'done', result, evaluatedSamples: plan.samples, finishedAt: new Date(), error: null });
  } finally {
    await compute.close();
  }
  return 'done';
}
