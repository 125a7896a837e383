import { requirePositive } from '../groups/require-positive';

/**
 * Velocity profile of a thin open film under a surface stress, no return flow: u(z) = τ z/μ.
 *
 * ## Method
 * μ u_zz = 0 with no slip at z = 0 and μ u_z = τ at the surface z = d (lubrication approximation,
 * no pressure gradient): a linear shear (Couette-like) profile.
 *
 * ## References
 * - Smith M. K., Davis S. H. (1983) J. Fluid Mech. 132, 119–144. doi:10.1017/S0022112083001512
 *
 * @param input.stress - surface shear stress τ [Pa], ≥ 0
 * @param input.depth - film depth d [m], > 0
 * @param input.viscosity - μ [Pa·s], > 0
 * @param input.height - height above the substrate z [m], 0 ≤ z ≤ d
 * @returns velocity along the surface stress at height z [m/s]
 * @example openFilmVelocity({ stress: 0.1, depth: 1e-3, viscosity: 0.01, height: 5e-4 }) // 0.005
 */
export function openFilmVelocity(input: { stress: number; depth: number; viscosity: number; height: number }): number {
  const tau = requirePositive('stress', input.stress, 'Pa', { allowZero: true });
  const d = requirePositive('depth', input.depth, 'm');
  const mu = requirePositive('viscosity', input.viscosity, 'Pa·s');
  const z = requirePositive('height', input.height, 'm', { allowZero: true });
  if (z > d) throw new RangeError(`height must be ≤ depth (${d} m), got ${z} m`);
  return (tau * z) / mu;
}
