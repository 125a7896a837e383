import type { SpreadChunk, SpreadPlan } from './spread-types';

/**
 * Joins pieces of one Property spread into a single chunk covering their union; the pieces may
 * arrive in any order but must be contiguous and not overlap. Merging is exact: the result equals
 * the chunk a single `runSpreadChunk` call over the whole range would give.
 *
 * ## Method
 * Sorts by start, checks that each piece begins where the previous ended, adds counts and
 * histogram slots, takes the extreme minimum and maximum, and concatenates margins and
 * sensitivity samples in sample order.
 *
 * ## References
 * - Chan T. F., Golub G. H., LeVeque R. J. (1979) "Updating formulae and a pairwise algorithm for
 *   computing sample variances", Stanford CS report STAN-CS-79-773 (combining partial tallies).
 *
 * @param plan - the plan every piece was run under
 * @param chunks - one or more pieces
 * @returns the merged chunk [-]
 * @example mergeSpreadChunks(plan, [second, first]).start // first.start
 */
export function mergeSpreadChunks(plan: SpreadPlan, chunks: readonly SpreadChunk[]): SpreadChunk {
  if (chunks.length === 0) throw new RangeError('chunks must contain at least one chunk');
  const sorted = [...chunks].sort((a, b) => a.start - b.start);
  for (let i = 1; i < sorted.length; i += 1) {
    if (sorted[i].start !== sorted[i - 1].end) {
      throw new RangeError(
        `chunks must be contiguous without overlap: one ends at sample ${sorted[i - 1].end}, the next starts at ${sorted[i].start}`,
      );
    }
  }
  const exact = plan.percentileMode === 'exact';
  for (const chunk of sorted) {
    if (chunk.end > plan.samples || (exact ? chunk.margins === null : chunk.histogramCounts === null)) {
      throw new RangeError(`chunk [${chunk.start}, ${chunk.end}) does not belong to this plan`);
    }
  }
  const histogram = exact ? null : sorted[0].histogramCounts!.map(() => 0);
  if (histogram) {
    for (const chunk of sorted) {
      const counts = chunk.histogramCounts!;
      if (counts.length !== histogram.length) throw new RangeError('chunks have different histogram layouts');
      for (let i = 0; i < counts.length; i += 1) histogram[i] += counts[i];
    }
  }
  return {
    start: sorted[0].start,
    end: sorted[sorted.length - 1].end,
    validCount: sorted.reduce((sum, c) => sum + c.validCount, 0),
    nonFiniteCount: sorted.reduce((sum, c) => sum + c.nonFiniteCount, 0),
    onsetCount: sorted.reduce((sum, c) => sum + c.onsetCount, 0),
    minimumMargin: Math.min(...sorted.map((c) => c.minimumMargin)),
    maximumMargin: Math.max(...sorted.map((c) => c.maximumMargin)),
    margins: exact ? sorted.flatMap((c) => c.margins!) : null,
    histogramCounts: histogram,
    sensitivityFactors: plan.properties.map((_, k) => sorted.flatMap((c) => c.sensitivityFactors[k] ?? [])),
    sensitivityMargins: sorted.flatMap((c) => c.sensitivityMargins),
  };
}
