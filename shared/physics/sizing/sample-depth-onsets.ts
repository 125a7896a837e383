import { pchipInterpolate } from './pchip-interpolate';

/** The three margins that a quiet window needs at one depth (ΔT = ±1 K). */
export interface DepthOnset {
  readonly margin: number;
  readonly cellMargin: number;
  readonly longWaveMargin: number;
  readonly longWave: boolean;
  /** True when this depth was solved directly rather than interpolated. */
  readonly solved: boolean;
}

const FIELDS = ['margin', 'cellMargin', 'longWaveMargin'] as const;

/** A margin that can be interpolated in log space: finite and > 0. */
const usable = (value: number) => Number.isFinite(value) && value > 0;

/**
 * Onset margins at many depths from few solves: adaptive sampling with shape-preserving
 * interpolation in log–log coordinates, refined until a tolerance is met.
 *
 * ## Method
 * The margins are smooth functions of depth (power laws Ra ∝ d³, Ma ∝ d, modified by Bi ∝ d, Cr ∝ 1/d,
 * Bo ∝ d²), so ln λ is nearly linear in ln d. Nine evenly spread depths are solved first. Each gap
 * between solved depths is then tested at its middle sample: the value predicted by PCHIP through
 * the solved depths (in ln d, ln λ) is compared with a direct solve there; if any of the margins
 * differs by more than the relative tolerance, both halves are refined the same way, else the gap is
 * accepted. A gap whose ends are finite on one side and infinite on the other (no onset) is always
 * refined, so such depths end up solved directly. With 24 or fewer depths, or a tolerance of 0,
 * every depth is solved.
 * The kink where the long-wave mode takes over from cells is resolved by this refinement.
 *
 * ## References
 * - Fritsch F. N., Carlson R. E. (1980) SIAM J. Numer. Anal. 17(2), 238–246. doi:10.1137/0717021
 * - Press W. H. et al. (2007) "Numerical Recipes", 3rd ed., §3.0 and §4.7 (adaptive refinement by
 *   comparing an estimate with a direct evaluation).
 *
 * @param depths - depths [m], strictly increasing
 * @param solve - the onset margins at one depth (a direct solve)
 * @param options - `tolerance`: relative error allowed on each margin (default 1e-3; 0 solves every depth)
 * @returns one {@link DepthOnset} per depth, in order
 * @example sampleDepthOnsets(depths, (d) => solveAt(d)).map((o) => o.margin)
 */
export function sampleDepthOnsets(
  depths: readonly number[],
  solve: (depth: number) => Omit<DepthOnset, 'solved'>,
  options: { tolerance?: number } = {},
): DepthOnset[] {
  const tolerance = options.tolerance ?? 1e-3;
  const n = depths.length;
  const exactOnly = tolerance === 0;
  const solved = new Map<number, Omit<DepthOnset, 'solved'>>();
  const solveIndex = (i: number) => {
    if (!solved.has(i)) solved.set(i, solve(depths[i]));
    return solved.get(i)!;
  };
  if (n <= 24 || exactOnly) return depths.map((_, i) => Object.freeze({ ...solveIndex(i), solved: true }));

  const initial = 5;
  for (let k = 0; k < initial; k += 1) solveIndex(Math.round((k * (n - 1)) / (initial - 1)));
  const logDepths = depths.map(Math.log);

  const predict = (i: number, field: (typeof FIELDS)[number]): number => {
    const nodes = [...solved.keys()].sort((a, b) => a - b);
    const exact = solved.get(i);
    if (exact) return exact[field];
    let right = nodes.findIndex((node) => node > i);
    if (right <= 0) right = right === 0 ? 1 : nodes.length - 1;
    const left = right - 1;
    const value = (position: number) => solved.get(nodes[position])![field];
    const a = value(left);
    const b = value(right);
    if (!usable(a) || !usable(b)) return a === b ? a : NaN;
    // PCHIP through the unbroken run of finite nodes around the gap, in (ln d, ln λ).
    let lo = left;
    while (lo > 0 && usable(value(lo - 1))) lo -= 1;
    let hi = right;
    while (hi < nodes.length - 1 && usable(value(hi + 1))) hi += 1;
    const xs: number[] = [];
    const ys: number[] = [];
    for (let position = lo; position <= hi; position += 1) {
      xs.push(logDepths[nodes[position]]);
      ys.push(Math.log(value(position)));
    }
    return Math.exp(pchipInterpolate(xs, ys, logDepths[i]));
  };

  const pending: [number, number][] = [];
  const nodes0 = [...solved.keys()].sort((a, b) => a - b);
  for (let k = 0; k + 1 < nodes0.length; k += 1) pending.push([nodes0[k], nodes0[k + 1]]);
  while (pending.length > 0) {
    const [a, b] = pending.pop()!;
    if (b - a <= 1) continue;
    const mid = (a + b) >> 1;
    const predicted = FIELDS.map((field) => predict(mid, field));
    const actual = solveIndex(mid);
    const good = FIELDS.every((field, f) => {
      const p = predicted[f];
      const v = actual[field];
      if (!usable(v) || !usable(p)) return p === v;
      return Math.abs(p / v - 1) <= tolerance;
    });
    if (!good) pending.push([a, mid], [mid, b]);
  }

  return depths.map((_, i) => {
    const direct = solved.get(i);
    if (direct) return Object.freeze({ ...direct, solved: true });
    const margin = predict(i, 'margin');
    const longWaveMargin = predict(i, 'longWaveMargin');
    return Object.freeze({
      margin,
      cellMargin: predict(i, 'cellMargin'),
      longWaveMargin,
      longWave: Number.isFinite(longWaveMargin) && longWaveMargin <= margin * (1 + 1e-9),
      solved: false,
    });
  });
}
