import { requirePositive } from './require-positive';

/**
 * Kinematic viscosity, ν = μ/ρ.
 *
 * ## Method
 * Definition (momentum diffusivity); valid for a Newtonian liquid.
 *
 * ## References
 * - Batchelor G. K. (1967) "An Introduction to Fluid Dynamics", Cambridge University Press, §3.3.
 *
 * @param input.viscosity - dynamic viscosity μ [Pa·s], > 0
 * @param input.density - density ρ [kg/m³], > 0
 * @returns kinematic viscosity ν [m²/s]
 * @example kinematicViscosity({ viscosity: 1.0016e-3, density: 998.2 }) // ≈ 1.0034e-6
 */
export function kinematicViscosity(input: { viscosity: number; density: number }): number {
  const mu = requirePositive('viscosity', input.viscosity, 'Pa·s');
  const rho = requirePositive('density', input.density, 'kg/m³');
  return mu / rho;
}
