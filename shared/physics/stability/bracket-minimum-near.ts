/** A point of λ in ln k: [ln k, λ]. */
export type LogPoint = readonly [number, number];

/** Half-width in ln k of the first bracket around the hint (k ± 1.5 %). */
const HALF_WIDTH = 0.015;
/** Steps allowed when the minimum lies outside the first bracket (reach ≈ 4.2 in ln k). */
const EXPANSIONS = 12;
/** Longest step in ln k (the ratio 1.6 of the coarse walk in minimiseMarginalFactor). */
const LONGEST_STEP = Math.log(1.6);

/**
 * Bracket the minimum of λ(k) close to an expected wavenumber.
 *
 * ## Method
 * Evaluates λ at ln k = ln hint and ln hint ± 0.015. If the middle is lowest, these three points
 * are the bracket. Otherwise it steps on downhill from the lower end with doubling steps (0.03,
 * 0.06, … in ln k, at most ln 1.6 as in the coarse walk; twelve steps at most) until λ rises again; the last three points then bracket a
 * minimum (golden-section style bracketing, Press et al. §10.1). Gives up (returns null) when a
 * value is infinite (no stationary mode there: the coarse scan handles branch ends), when a step
 * would leave [smallest, largest] (the k → 0 limit may be the minimum), or when λ still falls
 * after the last step.
 *
 * ## References
 * - Press, W. H. et al. (2007) *Numerical Recipes*, 3rd ed., Cambridge, §10.1 (bracketing a minimum).
 * - Brent, R. P. (1973) *Algorithms for Minimization without Derivatives*, Prentice-Hall, ch. 5.
 *
 * @param evaluate - λ(k) [-] for k [1/d] > 0; may return Infinity, never NaN
 * @param hint - expected wavenumber of the minimum [1/d]
 * @param smallest - smallest wavenumber the bracket may reach [1/d]
 * @param largest - largest wavenumber the bracket may reach [1/d]
 * @returns [lower, middle, upper] as [ln k, λ] with λ(middle) ≤ both ends, or null
 * @example bracketMinimumNear((k) => (k * k + 1) ** 3 / (k * k), 0.7, 0.01, 60) // three points around ln 0.7071
 */
export function bracketMinimumNear(
  evaluate: (wavenumber: number) => number,
  hint: number,
  smallest: number,
  largest: number,
): [LogPoint, LogPoint, LogPoint] | null {
  if (!(Number.isFinite(hint) && hint * Math.exp(-HALF_WIDTH) >= smallest && hint * Math.exp(HALF_WIDTH) <= largest)) return null;
  const centre = Math.log(hint);
  const at = (s: number): LogPoint => [s, evaluate(Math.exp(s))];
  const low = at(centre - HALF_WIDTH);
  const middle = at(centre);
  const high = at(centre + HALF_WIDTH);
  if (!Number.isFinite(low[1]) || !Number.isFinite(middle[1]) || !Number.isFinite(high[1])) return null;
  if (middle[1] <= low[1] && middle[1] <= high[1]) return [low, middle, high];
  const direction = low[1] < high[1] ? -1 : 1;
  let previous = middle;
  let end = direction < 0 ? low : high;
  let step = HALF_WIDTH;
  for (let i = 0; i < EXPANSIONS; i++) {
    step = Math.min(2 * step, LONGEST_STEP);
    const s = end[0] + direction * step;
    const k = Math.exp(s);
    if (k < smallest || k > largest) return null;
    const next: LogPoint = [s, evaluate(k)];
    if (!Number.isFinite(next[1])) return null;
    if (next[1] >= end[1]) return direction < 0 ? [next, end, previous] : [previous, end, next];
    previous = end;
    end = next;
  }
  return null;
}
