import { jumpXoshiro128State } from '../random/jump-xoshiro128-state';
import { seedXoshiro128State } from '../random/seed-xoshiro128-state';
import { marginHistogramBin } from './margin-histogram-bin';
import { samplePropertyFactor } from './sample-property-factor';
import type { SpreadChunk, SpreadEvaluator, SpreadPlan, SpreadRange } from './spread-types';

/**
 * Runs one piece of a Property spread — samples [start, start + count) — and returns its tallies,
 * ready to be merged with other pieces in any order by `mergeSpreadChunks`.
 *
 * ## Method
 * Block b of `plan.blockSize` samples draws from the seeded xoshiro128** stream jumped b times
 * (2⁶⁴ steps each), so a sample's values depend only on (seed, index) and a chunked run equals a
 * one-shot run exactly. In each sample every property in plan order gets a factor (normal 1σ or
 * uniform half-width, see `samplePropertyFactor`), the evaluator returns the margin, and the
 * chunk counts margins < 1 (onset), keeps the margin (exact mode) or its log-spaced bin
 * (histogram mode), and keeps the factors of samples with index < sensitivitySampleLimit.
 *
 * ## References
 * - Blackman D., Vigna S. (2021) ACM Trans. Math. Softw. 47(4):36 (jump-ahead streams).
 *   doi:10.1145/3460772
 * - Saltelli A. et al. (2008) "Global Sensitivity Analysis: The Primer", Wiley.
 *   doi:10.1002/9780470725184
 *
 * @param plan - from `createSpreadPlan`
 * @param range - start must be a multiple of plan.blockSize; the end must be one too, or the last sample
 * @param evaluate - margin of one sample; NaN marks a sample that cannot be judged
 * @returns the chunk's tallies (JSON-safe) [-]
 * @example runSpreadChunk(plan, { start: 0, count: 1000 }, (s) => s.x).end // 1000
 */
export function runSpreadChunk(plan: SpreadPlan, range: SpreadRange, evaluate: SpreadEvaluator): SpreadChunk {
  const { start, count } = range;
  const end = start + count;
  if (!Number.isInteger(start) || start < 0 || start % plan.blockSize !== 0) {
    throw new RangeError(`range.start must be a whole multiple of ${plan.blockSize} from 0, got ${start}`);
  }
  if (!Number.isInteger(count) || count < 1 || end > plan.samples) {
    throw new RangeError(`range.count must be a whole number from 1 to ${plan.samples - start}, got ${count}`);
  }
  if (end % plan.blockSize !== 0 && end !== plan.samples) {
    throw new RangeError(
      `range must end on a multiple of ${plan.blockSize} or at the last sample (${plan.samples}), got ${end}`,
    );
  }

  const properties = plan.properties;
  const names = properties.map((p) => p.name);
  const baseValues = properties.map((p) => plan.base[p.name]);
  const binCount = (plan.histogram.upperDecade - plan.histogram.lowerDecade) * plan.histogram.binsPerDecade;
  const histogram = plan.percentileMode === 'histogram' ? new Array<number>(binCount + 2).fill(0) : null;
  const margins: number[] | null = plan.percentileMode === 'exact' ? [] : null;
  const sensitivityFactors: number[][] = properties.map(() => []);
  const sensitivityMargins: number[] = [];
  const factors = new Float64Array(properties.length);
  let validCount = 0;
  let nonFiniteCount = 0;
  let onsetCount = 0;
  let minimumMargin = Number.MAX_VALUE;
  let maximumMargin = -Number.MAX_VALUE;

  const blockStart = seedXoshiro128State(plan.seed);
  const firstBlock = start / plan.blockSize;
  for (let b = 0; b < firstBlock; b += 1) jumpXoshiro128State(blockStart);
  let stream = Uint32Array.from(blockStart);

  for (let index = start; index < end; index += 1) {
    if (index !== start && index % plan.blockSize === 0) {
      jumpXoshiro128State(blockStart);
      stream = Uint32Array.from(blockStart);
    }
    const sample: Record<string, number> = { ...plan.base };
    for (let k = 0; k < properties.length; k += 1) {
      factors[k] = samplePropertyFactor(stream, properties[k]);
      sample[names[k]] = baseValues[k] * factors[k];
    }
    const raw = evaluate(sample, index);
    if (Number.isNaN(raw) || typeof raw !== 'number') {
      nonFiniteCount += 1;
      continue;
    }
    // ±Infinity (no drive at all) is kept as ±MAX_VALUE: same rank, and it survives JSON.
    const margin = Math.min(Math.max(raw, -Number.MAX_VALUE), Number.MAX_VALUE);
    validCount += 1;
    if (margin < 1) onsetCount += 1;
    if (margin < minimumMargin) minimumMargin = margin;
    if (margin > maximumMargin) maximumMargin = margin;
    if (margins) margins.push(margin);
    if (histogram) histogram[marginHistogramBin(margin, plan.histogram)] += 1;
    if (index < plan.sensitivitySampleLimit) {
      for (let k = 0; k < properties.length; k += 1) sensitivityFactors[k].push(factors[k]);
      sensitivityMargins.push(margin);
    }
  }

  return {
    start,
    end,
    validCount,
    nonFiniteCount,
    onsetCount,
    minimumMargin,
    maximumMargin,
    margins,
    histogramCounts: histogram,
    sensitivityFactors,
    sensitivityMargins,
  };
}
