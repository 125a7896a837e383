import { createMarginJudge, type MarginJudge } from '../../../shared/gauge/create-margin-judge';
import type { GaugeSnapshot } from '../../../shared/gauge/snapshot-layer';
import { UnprocessableError } from '../../errors';

/** Judges kept in memory, most recently used last. A signed snapshot never changes, so nothing goes stale. */
const MAX_CACHED = 16;
const cache = new Map<string, MarginJudge>();

/**
 * The margin judge of a signed sheet revision, built once from its snapshot (≈ 200 direct solves,
 * one to two seconds) and then reused for every upload, post and page of that revision.
 */
export function judgeForRevision(revisionId: string, snapshot: GaugeSnapshot): MarginJudge {
  const cached = cache.get(revisionId);
  if (cached) {
    cache.delete(revisionId);
    cache.set(revisionId, cached);
    return cached;
  }
  let judge: MarginJudge;
  try {
    judge = createMarginJudge(snapshot);
  } catch (error) {
    throw new UnprocessableError(`The released check cannot be rebuilt from this sheet's snapshot: ${(error as Error).message}`);
  }
  cache.set(revisionId, judge);
  while (cache.size > MAX_CACHED) cache.delete(cache.keys().next().value as string);
  return judge;
}
