import { histogramPercentile } from './histogram-percentile';
import { percentileType7 } from './percentile-type7';
import { spearmanRankCorrelation } from './spearman-rank-correlation';
import type { SpreadChunk, SpreadPlan, SpreadResult, SpreadSensitivity } from './spread-types';
import { wilsonScoreInterval } from './wilson-score-interval';

/** Standard normal 97.5 % quantile (Abramowitz & Stegun 1964, Table 26.5). */
const Z_95 = 1.959_963_984_540_054;

/** ±MAX_VALUE in chunks stands for ±Infinity (JSON-safe storage); restore it for display. */
function restoreInfinity(value: number): number {
  if (value >= Number.MAX_VALUE) return Number.POSITIVE_INFINITY;
  if (value <= -Number.MAX_VALUE) return Number.NEGATIVE_INFINITY;
  return value;
}

/**
 * Turns the tallies of a Property spread (one chunk, or merged chunks starting at sample 0) into
 * the figures a person reads: probability of onset with its uncertainty, margin percentiles and
 * which property moves the margin most.
 *
 * ## Method
 * - Onset probability p̂ = (samples with margin < 1)/(valid samples); binomial standard error
 *   √(p̂(1 − p̂)/n) and the Wilson score 95 % interval (Wilson 1927).
 * - Percentiles 5/50/95: Hyndman & Fan (1996) type 7 over all margins (exact mode) or over the
 *   log-spaced histogram (histogram mode, within 0.23 % inside 10⁻⁶ … 10⁶).
 * - Sensitivity: Spearman rank correlation between each sampled property factor and the margin
 *   over the first `sensitivitySampleLimit` samples, sorted by |ρ_S| (Saltelli et al. 2008 §1.2).
 *   Its sampling error near 0 is about 1/√(n − 1).
 *
 * ## References
 * - Wilson E. B. (1927) J. Am. Stat. Assoc. 22:209–212. doi:10.1080/01621459.1927.10502953
 * - Hyndman R. J., Fan Y. (1996) Am. Stat. 50(4):361–365. doi:10.1080/00031305.1996.10473566
 * - Saltelli A. et al. (2008) "Global Sensitivity Analysis: The Primer", Wiley.
 *   doi:10.1002/9780470725184
 *
 * @param plan - the run's plan
 * @param chunk - tallies from sample 0 onward (a partial run gives a partial summary)
 * @returns the spread summary [-]
 * @example summarizeSpread(plan, chunk).onsetProbability // share of samples with margin < 1
 */
export function summarizeSpread(plan: SpreadPlan, chunk: SpreadChunk): SpreadResult {
  if (chunk.start !== 0) throw new RangeError(`chunk must start at sample 0, got ${chunk.start}`);
  const n = chunk.validCount;
  if (n === 0) {
    throw new RangeError(`no sample gave a margin: all ${chunk.nonFiniteCount} evaluated samples returned NaN`);
  }
  const p = chunk.onsetCount / n;
  const extremes = { minimum: chunk.minimumMargin, maximum: chunk.maximumMargin };
  let percentile: (q: number) => number;
  if (plan.percentileMode === 'exact') {
    const sorted = Float64Array.from(chunk.margins ?? []).sort();
    percentile = (q) => percentileType7(sorted, q);
  } else {
    const counts = chunk.histogramCounts ?? [];
    percentile = (q) => histogramPercentile(counts, plan.histogram, q, extremes);
  }

  const m = chunk.sensitivityMargins.length;
  const sensitivity: SpreadSensitivity[] =
    m >= 3
      ? plan.properties.map((property, k) => {
          const rho = spearmanRankCorrelation(chunk.sensitivityFactors[k], chunk.sensitivityMargins);
          return Object.freeze({
            name: property.name,
            rankCorrelation: rho,
            direction: rho > 0 ? ('raises' as const) : rho < 0 ? ('lowers' as const) : ('none' as const),
          });
        })
      : [];
  sensitivity.sort((a, b) => Math.abs(b.rankCorrelation) - Math.abs(a.rankCorrelation));

  return Object.freeze({
    seed: plan.seed,
    requestedSamples: plan.samples,
    evaluatedSamples: chunk.end - chunk.start,
    progress: (chunk.end - chunk.start) / plan.samples,
    validSamples: n,
    nonFiniteSamples: chunk.nonFiniteCount,
    onsetProbability: p,
    onsetStandardError: Math.sqrt((p * (1 - p)) / n),
    onsetInterval95: wilsonScoreInterval(chunk.onsetCount, n, Z_95),
    marginPercentiles: Object.freeze({
      p5: restoreInfinity(percentile(0.05)),
      p50: restoreInfinity(percentile(0.5)),
      p95: restoreInfinity(percentile(0.95)),
    }),
    percentileMethod: plan.percentileMode,
    percentileRelativeResolution: plan.percentileMode === 'exact' ? 0 : 10 ** (1 / plan.histogram.binsPerDecade) - 1,
    minimumMargin: restoreInfinity(chunk.minimumMargin),
    maximumMargin: restoreInfinity(chunk.maximumMargin),
    sensitivity: Object.freeze(sensitivity),
    sensitivitySamples: m,
    sensitivityStandardError: m >= 3 ? 1 / Math.sqrt(m - 1) : Number.NaN,
  });
}
