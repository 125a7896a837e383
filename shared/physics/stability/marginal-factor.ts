import { createMarginalFactorEvaluator } from './create-marginal-factor-evaluator';
import type { StabilityProblem } from './types';
import { validateProblem } from './validate-problem';

/**
 * Marginal factor λ(k): the smallest positive λ for which (λ·Ra, λ·Ma) lies on the stationary
 * neutral curve at wavenumber k.
 *
 * ## Method
 * Linearised Boussinesq equations for a horizontal layer with a conduction base state, normal
 * modes e^{ikx}, growth rate 0 (so the Prandtl number drops out):
 * (D² − k²)²W = λRa k²Θ, (D² − k²)Θ = −W, with rigid/free bottom, conducting/insulating bottom,
 * rigid/free/surface top with a Biot condition, and on a 'surface' top the thermocapillary stress
 * D²W = −λMa k²(Θ − H) and, when crispation > 0, the deflection H from the normal-stress balance
 * (derivation in marginal-factor-at.ts). Both drives scale with ΔT, so for fixed k the problem is
 * a generalised eigenproblem in λ, solved by Chebyshev collocation and Hessenberg–QR; λ is the
 * reciprocal of the largest positive real eigenvalue of the reduced matrix. Valid for stationary
 * (non-oscillatory) onset; for Ra and Ma of opposite signs the onset may be oscillatory and is
 * not covered. On 'rigid' and 'free' tops Ma has no effect (no thermocapillary stress).
 *
 * ## References
 * - Chandrasekhar, S. (1961) *Hydrodynamic and Hydromagnetic Stability*, Oxford, ch. II.
 * - Pearson, J. R. A. (1958) J. Fluid Mech. 4, 489–500. doi:10.1017/S0022112058000616
 * - Nield, D. A. (1964) J. Fluid Mech. 19, 341–352. doi:10.1017/S0022112064000763
 * - Davis, S. H. (1987) Annu. Rev. Fluid Mech. 19, 403–435. doi:10.1146/annurev.fl.19.010187.002155
 *
 * @param problem - boundaries and operating point (Ra, Ma [-]; Bi [-]; optional Cr, Bo [-])
 * @param wavenumber - k [1/d], finite and > 0
 * @returns λ(k) [-] > 0, or Infinity when no stationary neutral mode exists along the ray at this k
 *          (for example both drives stabilising, or Ra = Ma = 0)
 * @throws RangeError naming the field when an input is non-finite or out of range
 * @example marginalFactor({ bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', biot: 0, rayleigh: 0, marangoni: 40 }, 1.993) // ≈ 1.99017 (Pearson: 79.607/40)
 */
export function marginalFactor(problem: StabilityProblem, wavenumber: number): number {
  const checked = validateProblem(problem);
  if (typeof wavenumber !== 'number' || !Number.isFinite(wavenumber) || wavenumber <= 0)
    throw new RangeError(`wavenumber must be a finite number > 0 [1/d], got ${String(wavenumber)}`);
  return createMarginalFactorEvaluator(checked)(wavenumber);
}
