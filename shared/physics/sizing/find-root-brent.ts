/** Result of a bracketed root search. */
export interface RootResult {
  /** Abscissa of the root. */
  readonly root: number;
  /** Function evaluations used. */
  readonly evaluations: number;
  /** True when the tolerance was met within the iteration limit. */
  readonly converged: boolean;
}

/**
 * Root of a continuous function inside a bracket [a, b] where it changes sign, by Brent's method.
 *
 * ## Method
 * Brent's combination of bisection, secant steps and inverse quadratic interpolation: it keeps a
 * bracket at every step, so it always converges for a continuous function, and it converges
 * superlinearly near a simple root. Stops when the bracket is narrower than
 * 2·eps·|b| + tolerance/2 or f(b) = 0.
 *
 * ## References
 * - Brent R. P. (1973) "Algorithms for Minimization without Derivatives", Prentice-Hall, ch. 4
 *   (procedure zero).
 * - Press W. H., Teukolsky S. A., Vetterling W. T., Flannery B. P. (2007) "Numerical Recipes",
 *   3rd ed., Cambridge, §9.3.
 *
 * @param f - the function (finite values inside [a, b])
 * @param a - one end of the bracket
 * @param b - the other end; f(a) and f(b) must differ in sign (or one be 0)
 * @param options - `tolerance` on the abscissa (default 1e-10), `maxIterations` (default 100)
 * @returns root, evaluations, converged
 * @throws RangeError when f(a) and f(b) have the same sign or are not finite
 * @example findRootBrent((x) => x * x - 2, 0, 2).root // ≈ 1.414213562
 */
export function findRootBrent(
  f: (x: number) => number,
  a: number,
  b: number,
  options: { tolerance?: number; maxIterations?: number } = {},
): RootResult {
  const tolerance = options.tolerance ?? 1e-10;
  const maxIterations = options.maxIterations ?? 100;
  let fa = f(a);
  let fb = f(b);
  let evaluations = 2;
  if (!Number.isFinite(fa) || !Number.isFinite(fb)) throw new RangeError(`f must be finite at both ends, got f(a)=${fa}, f(b)=${fb}`);
  if (fa === 0) return Object.freeze({ root: a, evaluations, converged: true });
  if (fb === 0) return Object.freeze({ root: b, evaluations, converged: true });
  if (fa * fb > 0) throw new RangeError(`root is not bracketed: f(a)=${fa} and f(b)=${fb} have the same sign`);
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 0; iteration < maxIterations; iteration += 1) {
    if (fb * fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * tolerance;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return Object.freeze({ root: b, evaluations, converged: true });
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
    evaluations += 1;
  }
  return Object.freeze({ root: b, evaluations, converged: false });
}
