/**
 * Confidence interval for a binomial proportion that stays inside [0, 1] and behaves well when
 * the observed share is 0 or 1 (unlike p̂ ± z·√(p̂(1 − p̂)/n)).
 *
 * ## Method
 * centre = (p̂ + z²/2n)/(1 + z²/n), half-width = z·√(p̂(1 − p̂)/n + z²/4n²)/(1 + z²/n), p̂ = x/n.
 *
 * ## References
 * - Wilson E. B. (1927) "Probable inference, the law of succession, and statistical inference",
 *   J. Am. Stat. Assoc. 22(158):209–212. doi:10.1080/01621459.1927.10502953
 * - Brown L. D., Cai T. T., DasGupta A. (2001) "Interval estimation for a binomial proportion",
 *   Stat. Sci. 16(2):101–133. doi:10.1214/ss/1009213286
 *
 * @param successes - x, 0 … n [-]
 * @param trials - n ≥ 1 [-]
 * @param z - standard normal quantile (1.959964 for 95 %) [-]
 * @returns [lower, upper] bounds of the proportion [-]
 * @example wilsonScoreInterval(0, 10, 1.959964) // [0, 0.27754]
 */
export function wilsonScoreInterval(successes: number, trials: number, z: number): readonly [number, number] {
  if (!Number.isInteger(trials) || trials < 1) throw new RangeError(`trials must be a whole number ≥ 1, got ${trials}`);
  if (!Number.isInteger(successes) || successes < 0 || successes > trials) {
    throw new RangeError(`successes must be a whole number from 0 to ${trials}, got ${successes}`);
  }
  if (!(z > 0 && Number.isFinite(z))) throw new RangeError(`z must be a positive number, got ${z}`);
  const p = successes / trials;
  const z2n = (z * z) / trials;
  const denominator = 1 + z2n;
  const centre = (p + z2n / 2) / denominator;
  const half = (z * Math.sqrt((p * (1 - p)) / trials + (z * z) / (4 * trials * trials))) / denominator;
  return Object.freeze([Math.max(0, centre - half), Math.min(1, centre + half)] as const);
}
