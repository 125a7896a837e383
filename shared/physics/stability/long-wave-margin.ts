import { createMarginalFactorEvaluator } from './create-marginal-factor-evaluator';
import { longWaveLimit } from './long-wave-limit';
import type { CheckedProblem } from './validate-problem';

/**
 * Margin of the long-wave (k → 0) mode of a deformable surface alone: OnsetResult.longWaveMargin.
 *
 * ## Method
 * λ(k) of the deformable problem extrapolated to k → 0 (longWaveLimit), the same evaluation the
 * onset solve (solveOnsetMargin) makes, so the value is identical; Infinity when the surface cannot
 * deform (crispation 0 or a rigid/free top). A depth search for the smallest quiet depth needs only
 * this number and saves both cellular searches.
 *
 * ## References
 * - VanHook, S. J. et al. (1997) J. Fluid Mech. 345, 45–78. doi:10.1017/S0022112097006101
 *   (long-wave threshold Ma = (2/3)Ga(1 + Bi)).
 *
 * @param checked - checked problem (see validateProblem)
 * @returns λ_LW [-] > 0, 0 when any drive destabilises (no gravity), or Infinity when there is no long-wave mode
 * @example longWaveMargin(validateProblem({ bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', biot: 0, rayleigh: 0, marangoni: 1, crispation: 1e-4, bond: 0.1 })) // ≈ (2/3)·(0.1/1e-4) = 666.7
 */
export function longWaveMargin(checked: CheckedProblem): number {
  if (!(checked.crispation > 0)) return Infinity;
  return longWaveLimit(createMarginalFactorEvaluator(checked), checked.bond);
}
