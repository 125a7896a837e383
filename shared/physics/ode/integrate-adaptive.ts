import type { AdaptiveOptions, DenseSegment, OdeEvent, OdeEventHit, OdeRightHandSide, OdeSolution } from './types';

// Dormand–Prince 5(4) tableau (Dormand & Prince 1980, Table 2; Hairer, Nørsett & Wanner 1993, Table II.5.2).
const C2 = 1 / 5, C3 = 3 / 10, C4 = 4 / 5, C5 = 8 / 9;
const A21 = 1 / 5;
const A31 = 3 / 40, A32 = 9 / 40;
const A41 = 44 / 45, A42 = -56 / 15, A43 = 32 / 9;
const A51 = 19372 / 6561, A52 = -25360 / 2187, A53 = 64448 / 6561, A54 = -212 / 729;
const A61 = 9017 / 3168, A62 = -355 / 33, A63 = 46732 / 5247, A64 = 49 / 176, A65 = -5103 / 18656;
const A71 = 35 / 384, A73 = 500 / 1113, A74 = 125 / 192, A75 = -2187 / 6784, A76 = 11 / 84;
// Error weights b − b̂ (5th minus embedded 4th order).
const E1 = 71 / 57600, E3 = -71 / 16695, E4 = 71 / 1920, E5 = -17253 / 339200, E6 = 22 / 525, E7 = -1 / 40;
// Dense-output weights of the 4th-order continuous extension (Hairer, Nørsett & Wanner 1993, §II.6, DOPRI5 code).
const D1 = -12715105075 / 11282082432, D3 = 87487479700 / 32700410799, D4 = -10690763975 / 1880347072;
const D5 = 701980252875 / 199316789632, D6 = -1453857185 / 822651844, D7 = 69997945 / 29380423;

const SAFETY = 0.9;
const FAC_MIN = 0.2;
const FAC_MAX = 10;
const EVENT_ITERATIONS = 100;

type DenseStep = DenseSegment;

function denseValue(step: DenseStep, t: number): number[] {
  const s = (t - step.t0) / step.h;
  const s1 = 1 - s;
  const out = new Array<number>(step.r1.length);
  for (let i = 0; i < out.length; i++) {
    out[i] = step.r1[i] + s * (step.r2[i] + s1 * (step.r3[i] + s * (step.r4[i] + s1 * step.r5[i])));
  }
  return out;
}

function checkFinite(values: number[], t: number, what: string): number[] {
  for (let i = 0; i < values.length; i++) {
    if (!Number.isFinite(values[i])) {
      throw new RangeError(`${what} component ${i} is not finite (${values[i]}) at t = ${t}`);
    }
  }
  return values;
}

function errorNorm(y: readonly number[], yNew: readonly number[], err: readonly number[], rtol: number, atol: readonly number[]): number {
  let sum = 0;
  for (let i = 0; i < y.length; i++) {
    const scale = atol[i] + rtol * Math.max(Math.abs(y[i]), Math.abs(yNew[i]));
    const r = err[i] / scale;
    sum += r * r;
  }
  return Math.sqrt(sum / y.length);
}

/** Root of g on the dense output of one step by the Illinois variant of regula falsi. */
function locateRoot(event: OdeEvent, step: DenseStep, ta: number, ga: number, tb: number, gb: number): number {
  const tolerance = 4 * Number.EPSILON * Math.max(Math.abs(ta), Math.abs(tb), Math.abs(step.h));
  let side = 0;
  for (let k = 0; k < EVENT_ITERATIONS && tb - ta > tolerance; k++) {
    const tm = (ta * gb - tb * ga) / (gb - ga);
    const t = Number.isFinite(tm) && tm > ta && tm < tb ? tm : 0.5 * (ta + tb);
    const g = event.g(t, denseValue(step, t));
    if (g === 0) return t;
    if (Math.sign(g) === Math.sign(ga)) {
      ta = t;
      ga = g;
      if (side === -1) gb /= 2;
      side = -1;
    } else {
      tb = t;
      gb = g;
      if (side === 1) ga /= 2;
      side = 1;
    }
  }
  return tb;
}

function crosses(event: OdeEvent, ga: number, gb: number): 'rising' | 'falling' | null {
  const direction = event.direction ?? 'either';
  if (ga < 0 && gb >= 0 && direction !== 'falling') return 'rising';
  if (ga > 0 && gb <= 0 && direction !== 'rising') return 'falling';
  return null;
}

/**
 * Integrates dy/dt = f(t, y) from t0 to tEnd (tEnd > t0) with the adaptive explicit Runge–Kutta
 * pair of Dormand and Prince, order 5 with an embedded order-4 error estimate.
 *
 * ## Method
 * Seven-stage Dormand–Prince 5(4) pair with FSAL (the last stage of a step is the first of the
 * next) and local extrapolation (the step advances with the 5th-order solution). The local error
 * estimate e = h·Σ(bᵢ − b̂ᵢ)kᵢ is measured in the RMS norm ‖e/(atol + rtol·max(|yₙ|,|yₙ₊₁|))‖ and
 * a step is accepted when the norm is ≤ 1; the next step is h·min(10, max(0.2, 0.9·err^(−1/5)))
 * (never growing right after a rejection), clipped to maxStep and to tEnd. The starting step
 * follows the algorithm of Hairer, Nørsett & Wanner (1993, §II.4). Dense output uses the
 * 4th-order continuous extension of the same steps; output times and event locations are read
 * from it, events by the Illinois (modified regula falsi) method on each step's interpolant.
 * Valid for non-stiff problems; for stiff ones the step is limited by stability and the step
 * budget runs out (status 'step-budget-exhausted'). Discontinuities in f (e.g. oven-zone
 * boundaries) should be integration end points, not interior points.
 *
 * ## References
 * - Dormand J.R., Prince P.J. (1980) "A family of embedded Runge–Kutta formulae",
 *   J. Comput. Appl. Math. 6(1):19–26. doi:10.1016/0771-050X(80)90013-3
 * - Hairer E., Nørsett S.P., Wanner G. (1993) "Solving Ordinary Differential Equations I:
 *   Nonstiff Problems", 2nd ed., Springer, §II.4 (step control, starting step), §II.5 (Table 5.2),
 *   §II.6 (dense output). doi:10.1007/978-3-540-78862-1
 *
 * @param rhs - right-hand side f(t, y) [units of y per unit of t]
 * @param t0 - initial time [units of t]
 * @param y0 - initial state (not modified)
 * @param tEnd - final time [units of t], must be > t0
 * @param options - tolerances, step limits, output times and events (see AdaptiveOptions)
 * @returns the solution: status, final state, accepted steps, dense samples at outputTimes,
 *   located events and counters. Throws RangeError on bad options or a non-finite f.
 * @example
 * integrateAdaptive((t, y) => [-y[0]], 0, [1], 1, { rtol: 1e-10, atol: 1e-12 }).yFinal[0]
 * // ≈ 0.36787944117 (= e^−1)
 */
export function integrateAdaptive(
  rhs: OdeRightHandSide,
  t0: number,
  y0: readonly number[],
  tEnd: number,
  options: AdaptiveOptions = {},
): OdeSolution {
  const n = y0.length;
  if (n === 0) throw new RangeError('y0 must have at least one component');
  if (!Number.isFinite(t0) || !Number.isFinite(tEnd)) throw new RangeError(`t0 and tEnd must be finite, got ${t0}, ${tEnd}`);
  if (!(tEnd > t0)) throw new RangeError(`tEnd must be > t0, got t0 = ${t0}, tEnd = ${tEnd}`);
  const rtol = options.rtol ?? 1e-6;
  if (!(rtol > 0) || rtol >= 1) throw new RangeError(`rtol must be in (0, 1), got ${rtol}`);
  const atolOption = options.atol ?? 1e-9;
  const atol = typeof atolOption === 'number' ? new Array<number>(n).fill(atolOption) : [...atolOption];
  if (atol.length !== n) throw new RangeError(`atol must have ${n} components, got ${atol.length}`);
  atol.forEach((a, i) => {
    if (!(a > 0)) throw new RangeError(`atol[${i}] must be > 0, got ${a}`);
  });
  const span = tEnd - t0;
  const maxStep = options.maxStep ?? span;
  if (!(maxStep > 0)) throw new RangeError(`maxStep must be > 0, got ${maxStep}`);
  const maxSteps = options.maxSteps ?? 100_000;
  if (!(maxSteps >= 1)) throw new RangeError(`maxSteps must be ≥ 1, got ${maxSteps}`);
  const keepSteps = options.keepSteps ?? true;
  const keepDense = options.dense ?? false;
  const segments: DenseSegment[] = [];
  const events = options.events ?? [];
  const outputTimes = [...(options.outputTimes ?? [])].sort((a, b) => a - b);
  for (const t of outputTimes) {
    if (!(t >= t0 && t <= tEnd)) throw new RangeError(`outputTimes must lie in [${t0}, ${tEnd}], got ${t}`);
  }

  const stats = { accepted: 0, rejected: 0, evaluations: 0 };
  const f = (t: number, y: readonly number[]): number[] => {
    stats.evaluations += 1;
    const dy = rhs(t, y);
    if (dy.length !== n) throw new RangeError(`rhs returned ${dy.length} components, expected ${n}`);
    return checkFinite(dy, t, 'rhs');
  };

  let t = t0;
  let y = checkFinite([...y0], t0, 'y0');
  let k1 = f(t, y);
  const stepTimes: number[] = keepSteps ? [t] : [];
  const stepStates: number[][] = keepSteps ? [[...y]] : [];
  const outT: number[] = [];
  const outY: number[][] = [];
  let nextOutput = 0;
  while (nextOutput < outputTimes.length && outputTimes[nextOutput] === t0) {
    outT.push(t0);
    outY.push([...y]);
    nextOutput += 1;
  }
  const hits: OdeEventHit[] = [];
  let gPrev = events.map((e) => e.g(t, y));

  // Starting step (Hairer, Nørsett & Wanner 1993, §II.4, "Starting step size").
  let h: number;
  if (options.initialStep !== undefined) {
    if (!(options.initialStep > 0)) throw new RangeError(`initialStep must be > 0, got ${options.initialStep}`);
    h = options.initialStep;
  } else {
    let d0 = 0, d1 = 0;
    for (let i = 0; i < n; i++) {
      const sc = atol[i] + rtol * Math.abs(y[i]);
      d0 += (y[i] / sc) ** 2;
      d1 += (k1[i] / sc) ** 2;
    }
    d0 = Math.sqrt(d0 / n);
    d1 = Math.sqrt(d1 / n);
    let h0 = d0 < 1e-5 || d1 < 1e-5 ? 1e-6 : 0.01 * (d0 / d1);
    h0 = Math.min(h0, maxStep, span);
    const y1 = y.map((v, i) => v + h0 * k1[i]);
    const f1 = f(t + h0, y1);
    let d2 = 0;
    for (let i = 0; i < n; i++) {
      const sc = atol[i] + rtol * Math.abs(y[i]);
      d2 += ((f1[i] - k1[i]) / sc) ** 2;
    }
    d2 = Math.sqrt(d2 / n) / h0;
    const dm = Math.max(d1, d2);
    const h1 = dm <= 1e-15 ? Math.max(1e-6, h0 * 1e-3) : (0.01 / dm) ** (1 / 5);
    h = Math.min(100 * h0, h1);
  }
  h = Math.min(h, maxStep, span);

  let status: OdeSolution['status'] = 'completed';
  let rejectedLast = false;
  let steps = 0;
  const ys = new Array<number>(n);

  while (t < tEnd) {
    if (steps >= maxSteps) {
      status = 'step-budget-exhausted';
      break;
    }
    const minStep = 16 * Number.EPSILON * Math.max(Math.abs(t), Math.abs(tEnd), 1e-300);
    if (h < minStep) {
      status = 'step-size-underflow';
      break;
    }
    // Land exactly on tEnd, and avoid a sliver of a last step.
    const last = t + 1.01 * h >= tEnd;
    if (last) h = tEnd - t;
    steps += 1;

    for (let i = 0; i < n; i++) ys[i] = y[i] + h * A21 * k1[i];
    const k2 = f(t + C2 * h, ys);
    for (let i = 0; i < n; i++) ys[i] = y[i] + h * (A31 * k1[i] + A32 * k2[i]);
    const k3 = f(t + C3 * h, ys);
    for (let i = 0; i < n; i++) ys[i] = y[i] + h * (A41 * k1[i] + A42 * k2[i] + A43 * k3[i]);
    const k4 = f(t + C4 * h, ys);
    for (let i = 0; i < n; i++) ys[i] = y[i] + h * (A51 * k1[i] + A52 * k2[i] + A53 * k3[i] + A54 * k4[i]);
    const k5 = f(t + C5 * h, ys);
    for (let i = 0; i < n; i++) ys[i] = y[i] + h * (A61 * k1[i] + A62 * k2[i] + A63 * k3[i] + A64 * k4[i] + A65 * k5[i]);
    const tNew = last ? tEnd : t + h;
    const k6 = f(tNew, ys);
    const yNew = new Array<number>(n);
    for (let i = 0; i < n; i++) {
      yNew[i] = y[i] + h * (A71 * k1[i] + A73 * k3[i] + A74 * k4[i] + A75 * k5[i] + A76 * k6[i]);
    }
    const k7 = f(tNew, yNew);
    const err = new Array<number>(n);
    for (let i = 0; i < n; i++) {
      err[i] = h * (E1 * k1[i] + E3 * k3[i] + E4 * k4[i] + E5 * k5[i] + E6 * k6[i] + E7 * k7[i]);
    }
    const norm = errorNorm(y, yNew, err, rtol, atol);
    const factor = norm === 0 ? FAC_MAX : Math.min(FAC_MAX, Math.max(FAC_MIN, SAFETY * norm ** -0.2));

    if (!(norm <= 1)) {
      stats.rejected += 1;
      rejectedLast = true;
      h *= Math.min(1, factor);
      continue;
    }

    stats.accepted += 1;
    const dense: DenseStep = { t0: t, h, r1: [...y], r2: new Array(n), r3: new Array(n), r4: new Array(n), r5: new Array(n) };
    for (let i = 0; i < n; i++) {
      const ydiff = yNew[i] - y[i];
      const bspl = h * k1[i] - ydiff;
      dense.r2[i] = ydiff;
      dense.r3[i] = bspl;
      dense.r4[i] = ydiff - h * k7[i] - bspl;
      dense.r5[i] = h * (D1 * k1[i] + D3 * k3[i] + D4 * k4[i] + D5 * k5[i] + D6 * k6[i] + D7 * k7[i]);
    }

    if (keepDense) segments.push(dense);

    // Events on this step: the earliest terminal crossing ends the integration there.
    let stopAt = Number.POSITIVE_INFINITY;
    const stepHits: OdeEventHit[] = [];
    const gNew = events.map((e) => e.g(tNew, yNew));
    events.forEach((event, j) => {
      const direction = crosses(event, gPrev[j], gNew[j]);
      if (direction === null) return;
      const tHit = gNew[j] === 0 ? tNew : locateRoot(event, dense, t, gPrev[j], tNew, gNew[j]);
      stepHits.push({ name: event.name, t: tHit, y: denseValue(dense, tHit), direction });
      if (event.terminal && tHit < stopAt) stopAt = tHit;
    });
    stepHits.sort((a, b) => a.t - b.t);
    const tReached = Math.min(tNew, stopAt);
    for (const hit of stepHits) if (hit.t <= tReached) hits.push(hit);

    while (nextOutput < outputTimes.length && outputTimes[nextOutput] <= tReached) {
      const to = outputTimes[nextOutput];
      outT.push(to);
      outY.push(to === tNew ? [...yNew] : denseValue(dense, to));
      nextOutput += 1;
    }

    if (stopAt <= tNew) {
      t = stopAt;
      y = stopAt === tNew ? yNew : denseValue(dense, stopAt);
      if (keepSteps) {
        stepTimes.push(t);
        stepStates.push([...y]);
      }
      status = 'terminated-by-event';
      break;
    }

    t = tNew;
    y = yNew;
    k1 = k7;
    gPrev = gNew;
    if (keepSteps) {
      stepTimes.push(t);
      stepStates.push([...y]);
    }
    h *= rejectedLast ? Math.min(1, factor) : factor;
    h = Math.min(h, maxStep);
    rejectedLast = false;
  }

  return {
    status,
    tFinal: t,
    yFinal: [...y],
    stepTimes,
    stepStates,
    outputTimes: outT,
    outputStates: outY,
    events: hits,
    dense: segments,
    stats,
  };
}
