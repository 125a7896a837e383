import type { MarginalMinimum } from './minimise-marginal-factor';

/** Tolerance on ln k in the refinement (k to about 3e-4 relative). */
const LOG_TOLERANCE = 1.5e-4;
/** Bracket width in ln k below which the parabola through it is trusted to predict the minimum (see Method). */
const NARROW_BRACKET = 0.031;
/** Distance in ln k of the probes that build a narrow bracket around a converging point. */
const PROBE = 0.015;
const GOLDEN = 0.381_966_011_250_105_1;

/**
 * Refine a bracketed minimum of λ(k) by safeguarded successive parabolic interpolation in ln k.
 *
 * ## Method
 * Works on s = ln k inside the bracket [lower, upper] around `middle` (points as [s, λ],
 * λ(middle) lowest). Each step evaluates the vertex of the parabola through the three points (a
 * golden-section step when that vertex is unusable or a value is infinite) and keeps the three
 * points that bracket the lowest value. As in Brent's method a parabolic step longer than half the
 * step before last is replaced by a golden-section step, so a lopsided bracket cannot make it
 * crawl. A small step is not taken as convergence while the bracket is wide (the parabola through
 * far points misplaces the minimum by up to |c₃/2c₂|·h²): once the vertex lies within 0.015 of the
 * best point, probes at ±0.015 make the bracket narrow first. It stops when the bracket is narrow
 * and a step is shorter than the tolerance (1.5e-4 in ln k), or by the early stop below. Near a
 * smooth minimum λ is close to quadratic in ln k, so this converges superlinearly (order ≈ 1.3).
 *
 * Early stop without a further evaluation: for λ = λ*(1 + c₂t² + c₃t³) about the minimum, the
 * parabola through three points at most h from the middle puts its vertex within about
 * |c₃/2c₂|·h² of the true minimum. |c₃/c₂| ≤ 0.3 on the neutral curves of this solver (measured
 * by finite differences at the minima of the rigid/rigid, free/free, Pearson and coupled
 * curves), so once the bracket is narrower than 0.031 (h ≤ 0.0155, vertex error ≤ 4e-5) and the
 * vertex lies within the tolerance of the best point, the minimum is within 2e-4 of that point:
 * its λ is then within c₂·(2e-4)² ≈ 6e-8 relative of the minimum (c₂ ≤ 1.5), and the vertex is
 * returned as the wavenumber.
 *
 * ## References
 * - Brent, R. P. (1973) *Algorithms for Minimization without Derivatives*, Prentice-Hall, ch. 5.
 * - Press, W. H. et al. (2007) *Numerical Recipes*, 3rd ed., Cambridge, §10.3 (parabolic
 *   interpolation and Brent's method).
 *
 * @param evaluate - λ(k) [-] for k [1/d] > 0; may return Infinity, never NaN
 * @param lower - [ln k, λ] of the lower end of the bracket
 * @param middle - [ln k, λ] of the lowest point, strictly inside the bracket
 * @param upper - [ln k, λ] of the upper end of the bracket
 * @returns minimum factor [-] and its wavenumber [1/d] (frozen)
 * @example refineBracketedMinimum((k) => (k * k + 1) ** 3 / (k * k), [Math.log(0.5), 9.77], [0, 8], [Math.log(2), 31.25]) // ≈ { factor: 6.75, wavenumber: 0.7071 }
 */
export function refineBracketedMinimum(
  evaluate: (k: number) => number,
  lower: readonly [number, number],
  middle: readonly [number, number],
  upper: readonly [number, number],
): MarginalMinimum {
  let [a, fa] = lower;
  let [x, fx] = middle;
  let [c, fc] = upper;
  const margin = LOG_TOLERANCE;
  let stepBeforeLast = c - a;
  let lastStep = c - a;
  for (let iter = 0; iter < 100; iter++) {
    let u = NaN;
    if (Number.isFinite(fa) && Number.isFinite(fc)) {
      const r = (x - a) * (fx - fc);
      const q = (x - c) * (fx - fa);
      const denominator = 2 * (r - q);
      if (denominator !== 0) u = x - ((x - a) * r - (x - c) * q) / denominator;
    }
    const narrow = c - a <= NARROW_BRACKET;
    if (narrow && Math.abs(u - x) <= margin && u > a && u < c) return Object.freeze({ factor: fx, wavenumber: Math.exp(u) });
    if (!narrow && Math.abs(u - x) < PROBE && u > a && u < c) {
      // The parabola through a wide bracket puts the minimum near x, but its vertex is not accurate
      // enough to stop on: probe at x ± 0.015 (on the vertex side first) to build a narrow bracket.
      // (A side counts as open when it is longer than the probe plus the tolerance, so a probe never
      // lands on an end already evaluated; both sides closed would make the bracket narrow.)
      u = c - x > PROBE + margin && (u >= x || x - a <= PROBE + margin) ? x + PROBE : x - PROBE;
    } else if (!(u > a + margin && u < c - margin && Math.abs(u - x) < 0.5 * stepBeforeLast)) {
      // Brent's safeguard: a parabolic step must fall inside the bracket and be shorter than half
      // the step before last; otherwise take a golden-section step into the larger part.
      u = c - x > x - a ? x + GOLDEN * (c - x) : x - GOLDEN * (x - a);
    }
    if (Math.abs(u - x) < margin) u = c - x > x - a ? x + margin : x - margin;
    stepBeforeLast = lastStep;
    lastStep = Math.abs(u - x);
    const fu = evaluate(Math.exp(u));
    const step = Math.abs(u - x);
    if (fu < fx) {
      if (u < x) {
        c = x;
        fc = fx;
      } else {
        a = x;
        fa = fx;
      }
      x = u;
      fx = fu;
    } else if (u < x) {
      a = u;
      fa = fu;
    } else {
      c = u;
      fc = fu;
    }
    if ((step <= 1.5 * margin && c - a <= NARROW_BRACKET) || c - a < 4 * margin) break;
  }
  return Object.freeze({ factor: fx, wavenumber: Math.exp(x) });
}
