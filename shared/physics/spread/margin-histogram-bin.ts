import type { SpreadHistogramSpec } from './spread-types';

/**
 * Index of the histogram slot for a margin: 0 is the underflow slot (margin below 10^lowerDecade,
 * including zero and negative margins), 1 … B are the log-spaced bins, B + 1 is the overflow slot.
 *
 * ## Method
 * bin = 1 + ⌊(log₁₀ m − lowerDecade)·binsPerDecade⌋ for 10^lower ≤ m < 10^upper; equal widths in
 * log m, so every bin spans the same relative range 10^(1/binsPerDecade).
 *
 * ## References
 * - Scott D. W. (2015) "Multivariate Density Estimation", 2nd ed., Wiley, ch. 3 (histograms on
 *   transformed scales). doi:10.1002/9781118575574
 *
 * @param margin - an Onset margin [×] (not NaN)
 * @param spec - bin layout
 * @returns slot index, 0 … B + 1 [-]
 * @example marginHistogramBin(1, { lowerDecade: -6, upperDecade: 6, binsPerDecade: 1000 }) // 6001
 */
export function marginHistogramBin(margin: number, spec: SpreadHistogramSpec): number {
  const binCount = (spec.upperDecade - spec.lowerDecade) * spec.binsPerDecade;
  if (!(margin >= 10 ** spec.lowerDecade)) return 0;
  if (margin >= 10 ** spec.upperDecade) return binCount + 1;
  const bin = Math.floor((Math.log10(margin) - spec.lowerDecade) * spec.binsPerDecade);
  return 1 + Math.min(Math.max(bin, 0), binCount - 1);
}
