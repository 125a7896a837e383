/** Average ranks (1-based), ties sharing the mean of their positions. */
function averageRanks(values: readonly number[]): Float64Array {
  const n = values.length;
  const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => values[a] - values[b]);
  const ranks = new Float64Array(n);
  let i = 0;
  while (i < n) {
    let j = i;
    while (j + 1 < n && values[order[j + 1]] === values[order[i]]) j += 1;
    const rank = (i + j) / 2 + 1;
    for (let k = i; k <= j; k += 1) ranks[order[k]] = rank;
    i = j + 1;
  }
  return ranks;
}

/**
 * Spearman rank correlation between two paired samples: how monotonically one moves with the
 * other, insensitive to the non-linear power laws that link properties to the margin.
 *
 * ## Method
 * Pearson correlation of the average ranks (ties share their mean rank). Returns 0 when either
 * sample is constant (no rank variation to correlate).
 *
 * ## References
 * - Spearman C. (1904) "The proof and measurement of association between two things",
 *   Am. J. Psychol. 15(1):72–101. doi:10.2307/1412159
 * - Saltelli A. et al. (2008) "Global Sensitivity Analysis: The Primer", Wiley, §1.2
 *   (rank-based sensitivity measures). doi:10.1002/9780470725184
 *
 * @param x - first sample
 * @param y - second sample, same length ≥ 2
 * @returns ρ_S, −1 … 1 [-]
 * @example spearmanRankCorrelation([1, 2, 3, 4], [1, 4, 9, 16]) // 1
 */
export function spearmanRankCorrelation(x: readonly number[], y: readonly number[]): number {
  if (x.length !== y.length) throw new RangeError(`x and y must have the same length, got ${x.length} and ${y.length}`);
  if (x.length < 2) throw new RangeError(`x and y need at least 2 pairs, got ${x.length}`);
  const rx = averageRanks(x);
  const ry = averageRanks(y);
  const mean = (x.length + 1) / 2;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < x.length; i += 1) {
    const dx = rx[i] - mean;
    const dy = ry[i] - mean;
    sxy += dx * dy;
    sxx += dx * dx;
    syy += dy * dy;
  }
  if (sxx === 0 || syy === 0) return 0;
  return sxy / Math.sqrt(sxx * syy);
}
