import { solveOnsetMargin } from './solve-onset-margin';
import type { OnsetMarginOptions, OnsetResult, StabilityProblem } from './types';
import { validateProblem } from './validate-problem';

/**
 * Onset margin λ* of a heated liquid layer: the smallest positive factor on the temperature
 * difference (Ra and Ma scaled together; Bi, Cr and Bo fixed) that brings the layer to stationary
 * onset, with the mode that sets in and its regime.
 *
 * ## Method
 * 1. Cellular problem with a flat surface (crispation ignored): λ(k) from marginalFactor,
 *    minimised over k (criticalFactor) → cellMargin, cellWavenumber.
 * 2. Deformable surface (top 'surface', crispation > 0): the long-wave limit λ(k → 0) of the
 *    deformable problem → longWaveMargin (for Ra = 0 and a rigid conducting bottom it equals
 *    VanHook et al.'s Ma_LW = (2/3)Ga(1 + Bi); with buoyancy λ_LW = (2/3)Ga(1 + Bi)/(Ma +
 *    (11/60)Bi·Ra), derived in marginal-factor-at.ts), and the deformable problem minimised over
 *    k (search started with a bracket around the flat k_c). The most dangerous mode is the lower of the two; it is
 *    long-wave when the k → 0 limit wins. With a flat surface the cellular result is the answer
 *    (its minimum may itself lie at k → 0, for example with two insulating walls, reported as
 *    wavenumber 0 but not as long-wave thinning, which needs a deforming surface).
 *    With options.wavenumberHint (for example the cellWavenumber of the previous depth in a sweep)
 *    step 1 starts with a narrow bracket around the hint instead of the coarse scan; when that
 *    bracket fails the coarse scan runs as without a hint (see minimiseMarginalFactor).
 * 3. buoyancyShare at the onset mode (see buoyancyShare) and the regime (see classifyRegime).
 * λ* ≥ 1 means quiet; λ* scales as 1/ΔT at fixed Bi, Cr, Bo.
 *
 * ## References
 * - Pearson, J. R. A. (1958) J. Fluid Mech. 4, 489–500. doi:10.1017/S0022112058000616
 * - Nield, D. A. (1964) J. Fluid Mech. 19, 341–352. doi:10.1017/S0022112064000763
 * - Davis, S. H. (1987) Annu. Rev. Fluid Mech. 19, 403–435. doi:10.1146/annurev.fl.19.010187.002155
 * - VanHook, S. J., Schatz, M. F., Swift, J. B., McCormick, W. D. & Swinney, H. L. (1997)
 *   "Long-wavelength surface-tension-driven Bénard convection: experiment and theory",
 *   J. Fluid Mech. 345, 45–78. doi:10.1017/S0022112097006101
 *
 * @param problem - boundaries and operating point: rayleigh, marangoni [-] (any sign), biot [-] ≥ 0
 *                  (Infinity = conducting top), crispation [-] ≥ 0 and bond [-] ≥ 0 (top 'surface')
 * @param options - wavenumberHint: expected flat cellular k_c [1/d], finite > 0 (optional; only
 *                  changes where the search starts)
 * @returns frozen OnsetResult. margin and cellMargin are Infinity when no stationary onset exists
 *          along the ray (both drives stabilising, or Ra = Ma = 0); then criticalWavenumber,
 *          cellWavenumber and buoyancyShare are NaN, mechanism is 'none', regime 'quiet', and
 *          onsetRayleigh/onsetMarangoni are ±Infinity (0 for a zero drive).
 * @throws RangeError naming the field when an input is non-finite or out of range (wavenumberHint included)
 * @example onsetMargin({ bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', biot: 0, rayleigh: 0, marangoni: 40 }).margin // ≈ 1.990 (Pearson 79.607/40): quiet
 */
export function onsetMargin(problem: StabilityProblem, options: OnsetMarginOptions = {}): OnsetResult {
  const checked = validateProblem(problem);
  const wavenumberHint = validateWavenumberHint(options?.wavenumberHint);
  return solveOnsetMargin(checked, problem, { cell: wavenumberHint }).result;
}

function validateWavenumberHint(hint: unknown): number | undefined {
  if (hint === undefined) return undefined;
  if (typeof hint !== 'number' || !Number.isFinite(hint) || hint <= 0)
    throw new RangeError(`wavenumberHint must be a finite number > 0 [1/d] when given, got ${String(hint)}`);
  return hint;
}
