import type { DenseSegment } from './types';

/**
 * State at time t read from the dense output of an integrateAdaptive run (options.dense = true).
 *
 * ## Method
 * Binary search for the accepted step [t0, t0 + h] containing t, then the 4th-order continuous
 * extension of the Dormand–Prince 5(4) pair on that step:
 * y(t) = r1 + s·(r2 + (1 − s)·(r3 + s·(r4 + (1 − s)·r5))), s = (t − t0)/h.
 *
 * ## References
 * - Hairer E., Nørsett S.P., Wanner G. (1993) "Solving Ordinary Differential Equations I", 2nd ed.,
 *   Springer, §II.6 (dense output of DOPRI5). doi:10.1007/978-3-540-78862-1
 * - Dormand J.R., Prince P.J. (1986) "Runge–Kutta triples", Comput. Math. Appl. 12A:1007–1017.
 *   doi:10.1016/0898-1221(86)90025-8
 *
 * @param segments - dense segments in time order (OdeSolution.dense), at least one
 * @param t - time inside the integrated span [units of t]
 * @returns the interpolated state; throws RangeError outside the span
 * @example denseOutputAt(integrateAdaptive((t, y) => [-y[0]], 0, [1], 1, { dense: true }).dense, 0.5)[0]
 * // ≈ 0.60653 (= e^−0.5)
 */
export function denseOutputAt(segments: readonly DenseSegment[], t: number): number[] {
  if (segments.length === 0) throw new RangeError('segments must not be empty (integrate with options.dense = true)');
  const first = segments[0];
  const last = segments[segments.length - 1];
  const end = last.t0 + last.h;
  if (!(t >= first.t0 && t <= end)) throw new RangeError(`t must lie in [${first.t0}, ${end}], got ${t}`);
  let lo = 0;
  let hi = segments.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (segments[mid].t0 <= t) lo = mid;
    else hi = mid - 1;
  }
  const seg = segments[lo];
  const s = (t - seg.t0) / seg.h;
  const s1 = 1 - s;
  const out = new Array<number>(seg.r1.length);
  for (let i = 0; i < out.length; i++) {
    out[i] = seg.r1[i] + s * (seg.r2[i] + s1 * (seg.r3[i] + s * (seg.r4[i] + s1 * seg.r5[i])));
  }
  return out;
}
