import { longWaveLimit } from './long-wave-limit';
import { minimiseMarginalFactor, type MarginalMinimum } from './minimise-marginal-factor';
import type { CheckedProblem } from './validate-problem';

/** Coarse scan: spans the cellular minima of all boundary sets here (k_c ≈ 2–3.5); the walk extends it. */
const SCAN: readonly number[] = [0.85, 1.45, 2.45, 4];
const SMALLEST_WAVENUMBER = 0.01;
const LARGEST_WAVENUMBER = 60;

/**
 * Minimum over the wavenumber of the marginal factor of one problem: λ* and k_c.
 *
 * ## Method
 * minimiseMarginalFactor on ln k (from a bracket around the hint when one is given) with a
 * coarse scan at k = 0.85, 1.45, 2.45, 4, walking
 * outwards to 0.01 ≤ k ≤ 60; below k = 0.01 the k → 0 limit (longWaveLimit, or the value supplied)
 * stands for the whole long-wave end. Short waves beyond k = 60 (cells narrower than d/10) are not
 * searched: no boundary set or drive ratio met in coating practice puts its minimum there.
 *
 * ## References
 * - Brent, R. P. (1973) *Algorithms for Minimization without Derivatives*, Prentice-Hall, ch. 5.
 * - Chandrasekhar, S. (1961) *Hydrodynamic and Hydromagnetic Stability*, Oxford, ch. II
 *   (marginal curves and their minima).
 *
 * @param problem - checked problem (see validateProblem)
 * @param evaluate - λ(k) for this problem (see createMarginalFactorEvaluator)
 * @param options - limitAtZero: λ as k → 0 if already known [-]; wavenumberHint: expected k_c [1/d]
 *                  (the search starts with a bracket around it and falls back to the coarse scan,
 *                  see minimiseMarginalFactor; ignored when Ra and Ma have opposite signs, where
 *                  λ(k) can have two cellular minima); scan: coarse-scan wavenumbers [1/d],
 *                  increasing (default 0.85, 1.45, 2.45, 4)
 * @returns λ* [-] (Infinity if none) and k_c [1/d] (0 for the k → 0 end, NaN if λ* is infinite)
 * @example criticalFactor(p, createMarginalFactorEvaluator(p)) // rigid/rigid with Ra = 1: ≈ { factor: 1707.762, wavenumber: 3.117 }
 */
export function criticalFactor(
  problem: CheckedProblem,
  evaluate: (wavenumber: number) => number,
  options: { readonly limitAtZero?: number; readonly wavenumberHint?: number; readonly scan?: readonly number[] } = {},
): MarginalMinimum {
  if (problem.rayleigh === 0 && problem.marangoni === 0) return Object.freeze({ factor: Infinity, wavenumber: NaN });
  const bond = problem.crispation > 0 ? problem.bond : 1;
  return minimiseMarginalFactor(evaluate, {
    scan: options.scan ?? SCAN,
    smallest: SMALLEST_WAVENUMBER,
    largest: LARGEST_WAVENUMBER,
    limitAtZero: () => options.limitAtZero ?? longWaveLimit(evaluate, bond),
    // With Ra and Ma of opposite signs λ(k) can have two cellular minima (a buoyancy and a
    // thermocapillary one): a bracket around a hint could stay in the higher one, so the hint is
    // used only when the drives do not oppose each other (then the curve has one cellular minimum).
    hint: problem.rayleigh * problem.marangoni < 0 ? undefined : options.wavenumberHint,
  });
}
