import type { SpreadHistogramSpec } from './spread-types';

/**
 * Percentile of margins that were tallied into log-spaced bins, following the type-7 definition
 * as closely as binned data allow.
 *
 * ## Method
 * The order statistics x₍k₎ and x₍k+1₎ around h = (n − 1)·p are located by cumulative counts; the
 * j-th of c values in a bin [10^a, 10^(a+w)) is placed at 10^(a + w·(j + ½)/c) (values spread evenly
 * in log m), then interpolated as in type 7. Inside the binned range the error is below one bin,
 * a relative 10^w − 1 (0.23 % for 1000 bins per decade). Order statistics in the underflow slot
 * are reported as the run's minimum and those in the overflow slot as its maximum.
 *
 * ## References
 * - Hyndman R. J., Fan Y. (1996) Am. Stat. 50(4):361–365, definition 7.
 *   doi:10.1080/00031305.1996.10473566
 * - Scott D. W. (2015) "Multivariate Density Estimation", 2nd ed., Wiley, ch. 3.
 *   doi:10.1002/9781118575574
 *
 * @param counts - [underflow, bins…, overflow] slot counts
 * @param spec - bin layout
 * @param probability - p, 0 … 1 [-]
 * @param extremes - smallest and largest tallied margin [×]
 * @returns the approximate percentile [×]
 * @example histogramPercentile(counts, spec, 0.5, { minimum: 0.4, maximum: 3 }) // ≈ median margin
 */
export function histogramPercentile(
  counts: readonly number[],
  spec: SpreadHistogramSpec,
  probability: number,
  extremes: { readonly minimum: number; readonly maximum: number },
): number {
  if (!(probability >= 0 && probability <= 1)) {
    throw new RangeError(`probability must be from 0 to 1, got ${probability}`);
  }
  const total = counts.reduce((sum, c) => sum + c, 0);
  if (total === 0) throw new RangeError('counts must hold at least one tallied margin');
  const width = 1 / spec.binsPerDecade;
  const lastSlot = counts.length - 1;

  const orderStatistic = (rank: number): number => {
    let seen = 0;
    for (let slot = 0; slot <= lastSlot; slot += 1) {
      const c = counts[slot];
      if (rank < seen + c) {
        if (slot === 0) return extremes.minimum;
        if (slot === lastSlot) return extremes.maximum;
        const j = rank - seen;
        const lowerLog = spec.lowerDecade + (slot - 1) * width;
        return 10 ** (lowerLog + (width * (j + 0.5)) / c);
      }
      seen += c;
    }
    return extremes.maximum;
  };

  const h = (total - 1) * probability;
  const k = Math.floor(h);
  const a = orderStatistic(k);
  if (h === k) return a;
  const b = orderStatistic(k + 1);
  return a + (h - k) * (b - a);
}
