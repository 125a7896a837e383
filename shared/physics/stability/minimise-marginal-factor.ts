import { bracketMinimumNear } from './bracket-minimum-near';
import { refineBracketedMinimum } from './refine-bracketed-minimum';

/** Minimum of λ(k) over the wavenumber. */
export interface MarginalMinimum {
  /** Smallest λ found [-]; Infinity if λ(k) is infinite at every wavenumber tried. */
  readonly factor: number;
  /** Wavenumber of that minimum [1/d]; 0 when the minimum is the k → 0 limit; NaN if factor is infinite. */
  readonly wavenumber: number;
}

/** Options of minimiseMarginalFactor. */
export interface MinimiseOptions {
  /** Wavenumbers of the coarse scan [1/d], increasing, all > 0. */
  readonly scan: readonly number[];
  /** Smallest wavenumber the downhill walk may reach before the k → 0 limit is used [1/d]. */
  readonly smallest: number;
  /** Largest wavenumber the downhill walk may reach [1/d]. */
  readonly largest: number;
  /** λ as k → 0 (for the walk past `smallest`); Infinity when the limit is not finite. */
  readonly limitAtZero: () => number;
  /**
   * Expected wavenumber of the minimum [1/d] (for example k_c of a neighbouring problem in a
   * sweep); when given, finite and within (smallest, largest), the search first brackets the
   * minimum close to it and uses the coarse scan only if that fails.
   */
  readonly hint?: number;
}

const STEP = 1.6; // ratio between neighbouring wavenumbers in the walk

/**
 * Minimise the marginal factor λ(k) over the wavenumber k > 0.
 *
 * ## Method
 * Coarse scan on the given grid (if λ is infinite at every point, three probes at 4·smallest,
 * k = 7 and k = 12 look for a stationary branch outside the grid); if the best point is at an end, walk on outwards by the ratio
 * 1.6 while λ keeps falling (towards `largest`, or towards `smallest` and then the k → 0 limit,
 * which is reported as wavenumber 0). The best point and its two neighbours bracket the minimum,
 * which safeguarded successive parabolic interpolation (as in Brent's method) refines in ln k
 * to about 3e-4 relative in k; λ at a smooth minimum is then correct to round-off of the
 * eigen-solve. Infinite values (no stationary mode at that k) count as "higher than any finite".
 * A second, deeper local minimum between two coarse points can be missed; the scan is chosen
 * dense enough for the neutral curves of this solver (one cellular minimum, plus the k → 0 end).
 *
 * With a `hint` the coarse scan is replaced by bracketMinimumNear: three points at ln k = ln hint
 * and ±0.015, widened downhill by doubling steps; the refinement then usually needs one or no
 * further evaluation. When that bracket fails (an infinite λ, a walk that leaves the wavenumber
 * range or keeps falling) the search starts again from the coarse scan, so a hint changes the
 * cost, not the minimum found, for a neutral curve with a single cellular minimum.
 *
 * ## References
 * - Brent, R. P. (1973) *Algorithms for Minimization without Derivatives*, Prentice-Hall, ch. 5.
 *
 * @param evaluate - λ(k) [-] for k [1/d] > 0; may return Infinity, never NaN
 * @param options - scan grid, walk limits and the k → 0 limit
 * @returns minimum factor [-] and its wavenumber [1/d] (frozen)
 * @example minimiseMarginalFactor((k) => (k * k + 1) ** 3 / (k * k), { scan: [0.5, 1, 2], smallest: 0.01, largest: 50, limitAtZero: () => Infinity }) // ≈ { factor: 6.75, wavenumber: 0.7071 }
 */
export function minimiseMarginalFactor(evaluate: (wavenumber: number) => number, options: MinimiseOptions): MarginalMinimum {
  if (options.hint !== undefined) {
    const bracket = bracketMinimumNear(evaluate, options.hint, options.smallest, options.largest);
    if (bracket !== null) return refineBracketedMinimum(evaluate, bracket[0], bracket[1], bracket[2]);
  }
  const ks = [...options.scan];
  const fs = ks.map((k) => evaluate(k));
  let best = indexOfMinimum(fs);
  if (!Number.isFinite(fs[best])) {
    // No stationary mode on the grid: probe much shorter and longer waves before giving up.
    for (const k of [options.smallest * 4, Math.min(7, options.largest), Math.min(12, options.largest)]) {
      const f = evaluate(k);
      if (Number.isFinite(f)) return minimiseMarginalFactor(evaluate, { ...options, hint: undefined, scan: [k / STEP, k, k * STEP] });
    }
    return Object.freeze({ factor: Infinity, wavenumber: NaN });
  }
  // Walk outwards while the end point is the lowest.
  while (best === ks.length - 1 && ks[best] * STEP <= options.largest) {
    const k = ks[best] * STEP;
    ks.push(k);
    fs.push(evaluate(k));
    if (fs[fs.length - 1] < fs[best]) best = fs.length - 1;
    else break;
  }
  while (best === 0) {
    const k = ks[0] / STEP;
    if (k < options.smallest) {
      const limit = options.limitAtZero();
      if (limit <= fs[0]) return Object.freeze({ factor: limit, wavenumber: 0 });
      break;
    }
    ks.unshift(k);
    fs.unshift(evaluate(k));
    if (fs[0] < fs[1]) best = 0;
    else {
      best = 1;
      break;
    }
  }
  if (best === 0 || best === ks.length - 1) return Object.freeze({ factor: fs[best], wavenumber: ks[best] });
  return refineBracketedMinimum(evaluate, [Math.log(ks[best - 1]), fs[best - 1]], [Math.log(ks[best]), fs[best]], [Math.log(ks[best + 1]), fs[best + 1]]);
}

function indexOfMinimum(values: readonly number[]): number {
  let best = 0;
  for (let i = 1; i < values.length; i++) if (values[i] < values[best]) best = i;
  return best;
}
