/**
 * Shape-preserving piecewise cubic Hermite interpolation (PCHIP) of tabulated points.
 *
 * ## Method
 * Monotone cubic Hermite interpolation: interior slopes from the three-point (parabolic) formula,
 * which is third-order accurate on smooth data, limited as proposed by Hyman to 3·min(|secants|) and
 * set to zero where the adjacent secants differ in sign (so no overshoot at a kink or extremum), which
 * satisfies the Fritsch–Carlson monotonicity conditions; end slopes by the shape-preserving
 * three-point formula. Between nodes the cubic Hermite form is evaluated.
 * With two nodes it reduces to linear interpolation. Query points outside the nodes are extrapolated
 * with the end cubic (callers stay inside).
 *
 * ## References
 * - Fritsch F. N., Carlson R. E. (1980) "Monotone piecewise cubic interpolation", SIAM J. Numer.
 *   Anal. 17(2), 238–246. doi:10.1137/0717021
 * - Hyman J. M. (1983) "Accurate monotonicity preserving cubic interpolation", SIAM J. Sci. Stat.
 *   Comput. 4(4), 645–654. doi:10.1137/0904045
 * - Fritsch F. N., Butland J. (1984) "A method for constructing local monotone piecewise cubic interpolants", SIAM J. Sci. Stat. Comput. 5(2):300–304 (weighted harmonic-mean slopes; the one-sided end slopes keep the same shape-preserving limits).
 *
 * @param xs - node abscissae, strictly increasing, at least 2
 * @param ys - node values, finite, same length as xs
 * @param x - query abscissa
 * @returns interpolated value
 * @example pchipInterpolate([0, 1, 2], [0, 1, 4], 1.5) // ≈ 2.25 (between 1 and 4, no overshoot)
 */
export function pchipInterpolate(xs: readonly number[], ys: readonly number[], x: number): number {
  const n = xs.length;
  if (n < 2 || ys.length !== n) throw new RangeError(`xs and ys must have the same length ≥ 2, got ${n} and ${ys.length}`);
  let i = 0;
  let hi = n - 1;
  if (x <= xs[0]) i = 0;
  else if (x >= xs[n - 1]) i = n - 2;
  else {
    let lo = 0;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (xs[mid] <= x) lo = mid;
      else hi = mid;
    }
    i = lo;
  }
  const h = xs[i + 1] - xs[i];
  const slope = (k: number) => (ys[k + 1] - ys[k]) / (xs[k + 1] - xs[k]);
  const derivative = (k: number): number => {
    if (n === 2) return slope(0);
    if (k === 0 || k === n - 1) {
      const first = k === 0;
      const h0 = first ? xs[1] - xs[0] : xs[n - 1] - xs[n - 2];
      const h1 = first ? xs[2] - xs[1] : xs[n - 2] - xs[n - 3];
      const d0 = first ? slope(0) : slope(n - 2);
      const d1 = first ? slope(1) : slope(n - 3);
      let d = ((2 * h0 + h1) * d0 - h0 * d1) / (h0 + h1);
      if (Math.sign(d) !== Math.sign(d0)) d = 0;
      else if (Math.sign(d0) !== Math.sign(d1) && Math.abs(d) > Math.abs(3 * d0)) d = 3 * d0;
      return d;
    }
    const dl = slope(k - 1);
    const dr = slope(k);
    if (dl === 0 || dr === 0 || Math.sign(dl) !== Math.sign(dr)) return 0;
    const hl = xs[k] - xs[k - 1];
    const hr = xs[k + 1] - xs[k];
    // Three-point (parabolic) derivative, third-order accurate on smooth data, then Hyman's limiter
    // |d| ≤ 3·min(|dl|, |dr|), which keeps the interpolant monotone between monotone data.
    const parabolic = (hr * dl + hl * dr) / (hl + hr);
    const bound = 3 * Math.min(Math.abs(dl), Math.abs(dr));
    return Math.sign(parabolic) * Math.min(Math.abs(parabolic), bound);
  };
  const t = (x - xs[i]) / h;
  const t2 = t * t;
  const t3 = t2 * t;
  return (
    (2 * t3 - 3 * t2 + 1) * ys[i] + (t3 - 2 * t2 + t) * h * derivative(i) + (-2 * t3 + 3 * t2) * ys[i + 1] + (t3 - t2) * h * derivative(i + 1)
  );
}
