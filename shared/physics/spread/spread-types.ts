/**
 * Types of a Property spread: a seeded Monte Carlo run over the stated uncertainties of the
 * properties behind an Onset margin. Plans and chunks are plain JSON-safe data (no Infinity, no
 * typed arrays) so that a job queue can store them between pieces of a long run.
 */

/** How a property's stated uncertainty is read. */
export type SpreadDistribution = 'normal' | 'uniform';

/**
 * One uncertain property. The sampled value is base × factor with
 * - `normal`: factor ~ N(1, u²) — the stated ± u is one standard deviation (redrawn while
 *   factor ≤ 0, so a property never changes sign; the redrawn share is Φ(−1/u): 3×10⁻⁵ at
 *   u = 0.25, 2.3 % at the largest allowed u = 0.5);
 * - `uniform`: factor ~ U(1 − u, 1 + u) — the stated ± u is the half-width (u < 1).
 */
export interface SpreadPropertySpec {
  /** Key of the property in `base` (e.g. `viscosity`). */
  readonly name: string;
  /** Relative uncertainty u as a fraction (0.05 for ± 5 %) [-]. */
  readonly relativeUncertainty: number;
  readonly distribution: SpreadDistribution;
}

/** Everything needed to start, split or repeat a run. */
export interface SpreadOptions {
  /** Nominal values of every property the evaluator reads, SI units. */
  readonly base: Readonly<Record<string, number>>;
  /** Properties to vary; every other entry of `base` stays at its nominal value. */
  readonly properties: readonly SpreadPropertySpec[];
  /** Number of samples, 1 … 10 000 000. */
  readonly samples: number;
  /** Seed, a whole number 0 … 2⁵³ − 1; the same seed and plan always give the same result. */
  readonly seed: number;
  /**
   * Runs of at most this many samples keep every margin and give exact type-7 percentiles;
   * longer runs use the fixed log-spaced histogram (default 20 000).
   */
  readonly exactPercentileLimit?: number;
  /** Sensitivity uses the first this many samples, in sample order (default 20 000). */
  readonly sensitivitySampleLimit?: number;
}

/** Fixed log-spaced bins used for percentiles of long runs. */
export interface SpreadHistogramSpec {
  /** log₁₀ of the lowest bin edge (margins below go to the underflow bin). */
  readonly lowerDecade: number;
  /** log₁₀ of the highest bin edge (margins at or above go to the overflow bin). */
  readonly upperDecade: number;
  readonly binsPerDecade: number;
}

/** A validated, frozen run description. */
export interface SpreadPlan {
  readonly version: 1;
  readonly base: Readonly<Record<string, number>>;
  readonly properties: readonly SpreadPropertySpec[];
  readonly samples: number;
  readonly seed: number;
  /** Samples per independent random stream; chunk boundaries fall on multiples of it. */
  readonly blockSize: number;
  readonly percentileMode: 'exact' | 'histogram';
  readonly sensitivitySampleLimit: number;
  readonly histogram: SpreadHistogramSpec;
}

/** Sample indices [start, start + count) of one piece of a run. */
export interface SpreadRange {
  readonly start: number;
  readonly count: number;
}

/**
 * Accumulated tallies of a contiguous range of samples. Margins of ±Infinity (no drive at all)
 * are stored as ±Number.MAX_VALUE so the chunk survives JSON; ranks and counts are unchanged.
 */
export interface SpreadChunk {
  readonly start: number;
  readonly end: number;
  /** Samples whose margin was a number (not NaN). */
  readonly validCount: number;
  /** Samples whose evaluator returned NaN; left out of every statistic. */
  readonly nonFiniteCount: number;
  /** Valid samples with margin < 1 (cells expected). */
  readonly onsetCount: number;
  readonly minimumMargin: number;
  readonly maximumMargin: number;
  /** Every valid margin in sample order (exact percentile mode), otherwise null. */
  readonly margins: readonly number[] | null;
  /** [underflow, bins…, overflow] counts (histogram mode), otherwise null. */
  readonly histogramCounts: readonly number[] | null;
  /** Sampled factors per property (plan order) and margins for sensitivity samples. */
  readonly sensitivityFactors: readonly (readonly number[])[];
  readonly sensitivityMargins: readonly number[];
}

/** Turns one sample of property values into an Onset margin (× , ≥ 1 quiet). */
export type SpreadEvaluator = (sample: Readonly<Record<string, number>>, index: number) => number;

/** Influence of one property on the margin. */
export interface SpreadSensitivity {
  readonly name: string;
  /** Spearman rank correlation between the sampled property and the margin, −1 … 1 [-]. */
  readonly rankCorrelation: number;
  /** `raises` when a larger value gives a larger (safer) margin. */
  readonly direction: 'raises' | 'lowers' | 'none';
}

/** Summary of a finished (or partial) run. */
export interface SpreadResult {
  readonly seed: number;
  readonly requestedSamples: number;
  readonly evaluatedSamples: number;
  /** Share of requested samples done, 0 … 1. */
  readonly progress: number;
  readonly validSamples: number;
  readonly nonFiniteSamples: number;
  /** Share of valid samples with margin < 1 [-]. */
  readonly onsetProbability: number;
  /** Binomial standard error √(p(1 − p)/n) [-]. */
  readonly onsetStandardError: number;
  /** Wilson score 95 % interval of the onset probability [-]. */
  readonly onsetInterval95: readonly [number, number];
  /** Margin percentiles (Hyndman & Fan 1996 type 7) [×]. */
  readonly marginPercentiles: { readonly p5: number; readonly p50: number; readonly p95: number };
  readonly percentileMethod: 'exact' | 'histogram';
  /** Largest relative error of a histogram percentile inside the binned range (0 when exact). */
  readonly percentileRelativeResolution: number;
  readonly minimumMargin: number;
  readonly maximumMargin: number;
  /** Sorted by |rankCorrelation|, largest first. */
  readonly sensitivity: readonly SpreadSensitivity[];
  readonly sensitivitySamples: number;
  /** Approximate standard error of a rank correlation near 0, 1/√(n − 1) [-]. */
  readonly sensitivityStandardError: number;
}

/** Margin change when one property moves by ± its stated uncertainty, others nominal. */
export interface SpreadSwing {
  readonly name: string;
  /** Margin with the property at base·(1 − u) [×]. */
  readonly marginLow: number;
  /** Margin with the property at base·(1 + u) [×]. */
  readonly marginHigh: number;
  /** |marginHigh − marginLow| [×]. */
  readonly swing: number;
}
