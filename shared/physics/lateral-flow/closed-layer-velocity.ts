import { requirePositive } from '../groups/require-positive';

/**
 * Velocity profile of a thin closed layer (no net flow) under a surface stress τ:
 * u(z) = (τ d/μ)·(¾ ζ² − ½ ζ), ζ = z/d.
 *
 * ## Method
 * Lubrication flow with a constant pressure gradient: μ u_zz = dp/dx, u(0) = 0, μ u_z(d) = τ and
 * zero net flux ∫₀ᵈ u dz = 0. With u = a z² + b z: b = −2ad/3 from the flux, and μ(2ad + b) = τ gives
 * a = 3τ/(4μd), b = −τ/(2μ); the surface moves at τd/(4μ) and the return flow peaks at −τd/(12μ) at
 * ζ = 1/3. The pressure gradient that drives the return flow is dp/dx = 2μa = 3τ/(2d).
 *
 * ## References
 * - Smith M. K., Davis S. H. (1983) J. Fluid Mech. 132, 119–144 (return-flow base state).
 *   doi:10.1017/S0022112083001512
 *
 * @param input.stress - surface shear stress τ [Pa], ≥ 0
 * @param input.depth - layer depth d [m], > 0
 * @param input.viscosity - μ [Pa·s], > 0
 * @param input.height - height above the bottom z [m], 0 ≤ z ≤ d
 * @returns velocity at height z [m/s], positive in the direction of the surface stress
 * @example closedLayerVelocity({ stress: 0.1, depth: 1e-3, viscosity: 0.01, height: 1e-3 }) // 0.0025
 */
export function closedLayerVelocity(input: { stress: number; depth: number; viscosity: number; height: number }): number {
  const tau = requirePositive('stress', input.stress, 'Pa', { allowZero: true });
  const d = requirePositive('depth', input.depth, 'm');
  const mu = requirePositive('viscosity', input.viscosity, 'Pa·s');
  const z = requirePositive('height', input.height, 'm', { allowZero: true });
  if (z > d) throw new RangeError(`height must be ≤ depth (${d} m), got ${z} m`);
  const zeta = z / d;
  return ((tau * d) / mu) * (0.75 * zeta * zeta - 0.5 * zeta);
}
