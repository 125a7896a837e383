/**
 * Sample percentile of sorted data by the definition most statistics packages use by default
 * (Hyndman & Fan type 7, linear interpolation between order statistics).
 *
 * ## Method
 * h = (n − 1)·p; Q(p) = x₍⌊h⌋₎ + (h − ⌊h⌋)·(x₍⌊h⌋+1₎ − x₍⌊h⌋₎) with 0-based order statistics x₍ᵢ₎.
 *
 * ## References
 * - Hyndman R. J., Fan Y. (1996) "Sample quantiles in statistical packages", Am. Stat.
 *   50(4):361–365, definition 7. doi:10.1080/00031305.1996.10473566
 *
 * @param sorted - data in ascending order, at least one value
 * @param probability - p, 0 … 1 [-]
 * @returns the percentile, in the data's unit
 * @example percentileType7([1, 2, 3, 4, 5, 6, 7, 8, 9, 10], 0.05) // 1.45
 */
export function percentileType7(sorted: ArrayLike<number>, probability: number): number {
  if (sorted.length === 0) throw new RangeError('sorted must hold at least one value');
  if (!(probability >= 0 && probability <= 1)) {
    throw new RangeError(`probability must be from 0 to 1, got ${probability}`);
  }
  const h = (sorted.length - 1) * probability;
  const lower = Math.floor(h);
  const upper = Math.min(lower + 1, sorted.length - 1);
  const a = sorted[lower];
  const b = sorted[upper];
  return a === b ? a : a + (h - lower) * (b - a);
}
