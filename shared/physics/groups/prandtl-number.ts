import { requirePositive } from './require-positive';

/**
 * Prandtl number, Pr = ν/κ.
 *
 * ## Method
 * Ratio of momentum to thermal diffusivity. Stationary onset with a flat surface does not depend on
 * Pr; it is reported because oscillatory and deformable-surface behaviour does.
 *
 * ## References
 * - Bergman T. L. et al. (2011) "Fundamentals of Heat and Mass Transfer", 7th ed., eq. 6.55.
 *
 * @param input.kinematicViscosity - ν [m²/s], > 0
 * @param input.thermalDiffusivity - κ [m²/s], > 0
 * @returns Prandtl number [-]
 * @example prandtlNumber({ kinematicViscosity: 1.0034e-6, thermalDiffusivity: 1.433e-7 }) // ≈ 7.0
 */
export function prandtlNumber(input: { kinematicViscosity: number; thermalDiffusivity: number }): number {
  const nu = requirePositive('kinematicViscosity', input.kinematicViscosity, 'm²/s');
  const kappa = requirePositive('thermalDiffusivity', input.thermalDiffusivity, 'm²/s');
  return nu / kappa;
}
