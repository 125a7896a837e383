import { nextUniform } from '../random/next-uniform';
import { seedXoshiro128State } from '../random/seed-xoshiro128-state';
import { solveLeastSquares } from './solve-least-squares';
import type { SpreadEvaluator, SpreadPropertySpec } from './spread-types';

/** A fitted response surface and how well it reproduced the full evaluator. */
export interface MarginSurrogate {
  /** Fast stand-in for the full evaluator inside the fitted box. */
  readonly evaluate: SpreadEvaluator;
  /** Largest |surrogate/full − 1| over the validation points [-]. */
  readonly maxRelativeError: number;
  /** Root-mean-square relative error over the validation points [-]. */
  readonly rmsRelativeError: number;
  /** Validation points where surrogate and full evaluator disagree on onset (margin < 1). */
  readonly onsetDisagreements: number;
  readonly designEvaluations: number;
  readonly validationEvaluations: number;
  /** Half-width of the fitted box in standard deviations (normal) or half-widths (uniform). */
  readonly spanSigma: number;
}

/**
 * Fits a quadratic response surface of ln(margin) in the logarithms of the property factors, and
 * checks it against the full evaluator at fresh random points — a metamodel that makes a
 * 10 000-sample Property spread affordable when one margin costs a full stability solve.
 *
 * ## Method
 * Variables xₖ = ln(factorₖ) on a box of ± spanSigma·u (normal; factor floored at 0.05) or ± u
 * (uniform). Model per mode: ln M = c₀ + Σ cₖxₖ + Σ_{k≤j} c_kj xₖxⱼ (exact for products of power
 * laws such as Ma = |dσ/dT|ΔT d/(μκ)). Onset is set by whichever mode goes first, so the margin is
 * the smallest of several smooth mode margins with a kink where they cross; `evaluateModes` returns
 * each mode's margin (NaN where that mode is not determined) and every mode gets its own surface
 * from the design points where it is determined; the surrogate margin is their minimum. Design: the
 * centre, the 2K axial points and seeded uniform points up to 2× the number of coefficients,
 * solved by Householder least squares; `validationPoints` seeded points compare surrogate and full
 * margins (smallest determined mode). Large validation errors tell the caller to use the full
 * evaluator instead.
 *
 * ## References
 * - Saltelli A. et al. (2008) "Global Sensitivity Analysis: The Primer", Wiley, ch. 5 (emulators
 *   and metamodels for costly models). doi:10.1002/9780470725184
 * - Box G. E. P., Wilson K. B. (1951) "On the experimental attainment of optimum conditions",
 *   J. R. Stat. Soc. B 13(1):1–45 (quadratic response surfaces, central and axial points).
 * - Golub G. H., Van Loan C. F. (2013) "Matrix Computations", 4th ed., §5.3 (least squares).
 *
 * @param input.base - nominal property values (SI)
 * @param input.properties - uncertain properties
 * @param input.evaluateModes - the full (costly) evaluator: margin of each onset mode, NaN if undetermined
 * @param input.seed - seed for design and validation points
 * @param input.validationPoints - default 24
 * @param input.spanSigma - box half-width in σ for normal properties, default 4
 * @returns the surrogate and its validation errors
 * @example fitMarginSurrogate({ base: { x: 2 }, properties: [{ name: 'x', relativeUncertainty: 0.1,
 *   distribution: 'normal' }], evaluateModes: (s) => [s.x ** 2], seed: 1 }).maxRelativeError // ≈ 0
 */
export function fitMarginSurrogate(input: {
  readonly base: Readonly<Record<string, number>>;
  readonly properties: readonly SpreadPropertySpec[];
  readonly evaluateModes: (sample: Readonly<Record<string, number>>, index: number) => readonly number[];
  readonly seed: number;
  readonly validationPoints?: number;
  readonly spanSigma?: number;
}): MarginSurrogate {
  const { base, properties, evaluateModes } = input;
  const spanSigma = input.spanSigma ?? 4;
  const validationPoints = input.validationPoints ?? 24;
  if (!(spanSigma > 0 && spanSigma <= 10)) throw new RangeError(`spanSigma must be > 0 and ≤ 10, got ${spanSigma}`);
  if (!Number.isInteger(validationPoints) || validationPoints < 1 || validationPoints > 10_000) {
    throw new RangeError(`validationPoints must be a whole number from 1 to 10000, got ${validationPoints}`);
  }
  const k = properties.length;
  if (k === 0) throw new RangeError('properties must list at least one property to vary');
  const lower = properties.map((p) =>
    p.distribution === 'uniform'
      ? Math.log(1 - p.relativeUncertainty)
      : Math.log(Math.max(1 - spanSigma * p.relativeUncertainty, 0.05)),
  );
  const upper = properties.map((p) =>
    Math.log(1 + (p.distribution === 'uniform' ? 1 : spanSigma) * p.relativeUncertainty),
  );
  const active = properties.map((p) => p.relativeUncertainty > 0);

  const basis = (x: ArrayLike<number>): number[] => {
    const row = [1];
    for (let i = 0; i < k; i += 1) if (active[i]) row.push(x[i]);
    for (let i = 0; i < k; i += 1) {
      if (!active[i]) continue;
      for (let j = i; j < k; j += 1) if (active[j]) row.push(x[i] * x[j]);
    }
    return row;
  };
  const sampleAt = (x: ArrayLike<number>): Record<string, number> => {
    const sample: Record<string, number> = { ...base };
    for (let i = 0; i < k; i += 1) sample[properties[i].name] = base[properties[i].name] * Math.exp(x[i]);
    return sample;
  };
  /** Mode margins with undetermined, infinite or non-positive values as NaN. */
  const modesAt = (x: ArrayLike<number>, index: number): number[] =>
    evaluateModes(sampleAt(x), index).map((m) => (m > 0 && Number.isFinite(m) ? m : Number.NaN));
  const smallest = (values: readonly number[]): number => {
    let m = Number.POSITIVE_INFINITY;
    for (const v of values) if (v < m) m = v;
    return m;
  };

  const coefficientCount = basis(new Float64Array(k)).length;
  const design: Float64Array[] = [new Float64Array(k)];
  for (let i = 0; i < k; i += 1) {
    if (!active[i]) continue;
    const low = new Float64Array(k);
    low[i] = lower[i];
    const high = new Float64Array(k);
    high[i] = upper[i];
    design.push(low, high);
  }
  const state = seedXoshiro128State(input.seed);
  const randomPoint = (): Float64Array => {
    const x = new Float64Array(k);
    for (let i = 0; i < k; i += 1) x[i] = active[i] ? lower[i] + (upper[i] - lower[i]) * nextUniform(state) : 0;
    return x;
  };
  while (design.length < 2 * coefficientCount) design.push(randomPoint());
  const rows = design.map(basis);
  const designModes = design.map((x, i) => modesAt(x, -1 - i));
  const modeCount = designModes[0].length;
  if (modeCount === 0) throw new RangeError('evaluateModes must return at least one mode margin');

  const fits: number[][] = [];
  for (let mode = 0; mode < modeCount; mode += 1) {
    const used = designModes.map((modes, i) => ({ i, y: modes[mode] })).filter((d) => !Number.isNaN(d.y));
    if (used.length < coefficientCount + 1) continue;
    fits.push(solveLeastSquares(used.map((d) => rows[d.i]), used.map((d) => Math.log(d.y))));
  }
  if (fits.length === 0) {
    throw new RangeError('the response surface needs a positive finite margin at most design points; no mode had enough');
  }

  const predict = (x: ArrayLike<number>): number => {
    const row = basis(x);
    let best = Number.POSITIVE_INFINITY;
    for (const c of fits) {
      let s = 0;
      for (let i = 0; i < row.length; i += 1) s += row[i] * c[i];
      if (s < best) best = s;
    }
    return Math.exp(best);
  };
  const names = properties.map((p) => p.name);
  const baseValues = properties.map((p) => base[p.name]);
  const x = new Float64Array(k);
  const surrogate: SpreadEvaluator = (sample) => {
    for (let i = 0; i < k; i += 1) x[i] = Math.log(sample[names[i]] / baseValues[i]);
    return predict(x);
  };

  let maxRelativeError = 0;
  let sumSquares = 0;
  let onsetDisagreements = 0;
  for (let v = 0; v < validationPoints; v += 1) {
    const point = randomPoint();
    const full = smallest(modesAt(point, -1 - design.length - v));
    const fitted = predict(point);
    const relative = Number.isFinite(full) ? Math.abs(fitted / full - 1) : Number.POSITIVE_INFINITY;
    maxRelativeError = Math.max(maxRelativeError, relative);
    sumSquares += relative * relative;
    if (full < 1 !== fitted < 1) onsetDisagreements += 1;
  }
  return Object.freeze({
    evaluate: surrogate,
    maxRelativeError,
    rmsRelativeError: Math.sqrt(sumSquares / validationPoints),
    onsetDisagreements,
    designEvaluations: design.length,
    validationEvaluations: validationPoints,
    spanSigma,
  });
}
