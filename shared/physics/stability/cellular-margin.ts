import { createMarginalFactorEvaluator } from './create-marginal-factor-evaluator';
import { criticalFactor } from './critical-factor';
import type { MarginalMinimum } from './minimise-marginal-factor';
import type { CheckedProblem } from './validate-problem';

/**
 * Margin of the flat-surface cellular mode alone: the minimum of λ(k) over k with the surface held
 * flat (crispation set to 0), which is OnsetResult.cellMargin and cellWavenumber.
 *
 * ## Method
 * The first step of the onset solve (solveOnsetMargin), on its own: criticalFactor on the flat
 * problem, bracketing around `wavenumberHint` when one is given, else the coarse scan. A caller
 * that needs only this number (a depth search for the largest quiet depth) saves the long-wave,
 * deformable-surface and buoyancy-share solves; the value is the one solveOnsetMargin reports for
 * the same problem and hint.
 *
 * ## References
 * - Pearson, J. R. A. (1958) J. Fluid Mech. 4, 489–500. doi:10.1017/S0022112058000616
 * - Nield, D. A. (1964) J. Fluid Mech. 19, 341–352. doi:10.1017/S0022112064000763
 *
 * @param checked - checked problem (see validateProblem); a deformable surface is treated as flat
 * @param wavenumberHint - expected k_c [1/d], finite > 0, or undefined for the coarse scan
 * @returns minimum λ [-] (Infinity when no stationary mode) and its wavenumber [1/d] (frozen)
 * @example flatCellularMinimum(validateProblem({ bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', biot: 0, rayleigh: 0, marangoni: 40 }), undefined).factor // ≈ 1.99017 (Pearson: 79.607/40)
 */
export function flatCellularMinimum(checked: CheckedProblem, wavenumberHint: number | undefined): MarginalMinimum {
  const flat = checked.crispation > 0 ? { ...checked, crispation: 0 } : checked;
  return criticalFactor(flat, createMarginalFactorEvaluator(flat), { wavenumberHint });
}
