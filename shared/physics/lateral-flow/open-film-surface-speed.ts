import { requirePositive } from '../groups/require-positive';

/**
 * Surface speed of a thin open film dragged by a surface stress τ with no return flow, u_s = τ d/μ.
 *
 * ## Method
 * Lubrication (thin-layer) flow with no pressure gradient: μ u_zz = 0, u(0) = 0 on the substrate and
 * μ u_z(d) = τ at the surface give the linear shear profile u(z) = τ z/μ
 * ({@link openFilmVelocity}); at z = d, u_s = τ d/μ. Valid for d ≪ L and a low reduced Reynolds
 * number ρ u_s d²/(μ L) ≪ 1; gravity along the film is neglected.
 *
 * ## References
 * - Smith M. K., Davis S. H. (1983) J. Fluid Mech. 132, 119–144 (open layer: linear-flow base state).
 *   doi:10.1017/S0022112083001512
 *
 * @param input.stress - surface shear stress τ [Pa], ≥ 0
 * @param input.depth - film depth d [m], > 0
 * @param input.viscosity - μ [Pa·s], > 0
 * @returns surface speed [m/s]
 * @example openFilmSurfaceSpeed({ stress: 0.1, depth: 1e-3, viscosity: 0.01 }) // 0.01
 */
export function openFilmSurfaceSpeed(input: { stress: number; depth: number; viscosity: number }): number {
  const tau = requirePositive('stress', input.stress, 'Pa', { allowZero: true });
  const d = requirePositive('depth', input.depth, 'm');
  const mu = requirePositive('viscosity', input.viscosity, 'Pa·s');
  return (tau * d) / mu;
}
