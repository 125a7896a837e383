import { requireFinite } from '../groups/require-finite';
import { requirePositive } from '../groups/require-positive';

/**
 * Order-of-magnitude speed of the thermocapillary surface flow of a melt pool, with the surface
 * stress that drives it.
 *
 * ## Method
 * Surface stress τ = |dγ/dT|·ΔT/L. In a momentum boundary layer of thickness δ ≈ √(μL/(ρu)) the
 * stress balances viscous shear, τ ≈ μu/δ, which gives u ≈ (τ²·L/(ρ·μ))^(1/3)
 * = (|dγ/dT|·ΔT)^(2/3)/(ρ·μ·L)^(1/3). A scale, not a solution: real pools run somewhat slower
 * (viscous and heat losses, curved surfaces, other forces); use it to rank cases and to judge Pe.
 *
 * ## References
 * - DebRoy T., David S. A. (1995) "Physical processes in fusion welding", Rev. Mod. Phys.
 *   67(1):85–112, §III.B (order-of-magnitude velocity of Marangoni convection).
 *   doi:10.1103/RevModPhys.67.85
 * - Schlichting H., Gersten K. (2017) "Boundary-Layer Theory", 9th ed., Springer (laminar
 *   boundary-layer thickness δ ~ √(νL/u)). doi:10.1007/978-3-662-52919-5
 *
 * @param input.surfaceTensionSlope - dγ/dT [N/(m·K)], either sign
 * @param input.temperatureDifference - ΔT along the surface [K], ≥ 0
 * @param input.length - pool half-width L [m], > 0
 * @param input.density - liquid density ρ [kg/m³], > 0
 * @param input.viscosity - dynamic viscosity μ [Pa·s], > 0
 * @returns surface stress τ [Pa], velocity scale u [m/s] and boundary-layer thickness δ [m]
 * @example marangoniSurfaceVelocity({ surfaceTensionSlope: -4e-4, temperatureDifference: 1000,
 *   length: 3e-3, density: 7000, viscosity: 6e-3 }).velocity // ≈ 1.083
 */
export function marangoniSurfaceVelocity(input: {
  readonly surfaceTensionSlope: number;
  readonly temperatureDifference: number;
  readonly length: number;
  readonly density: number;
  readonly viscosity: number;
}): { readonly surfaceStress: number; readonly velocity: number; readonly boundaryLayerThickness: number } {
  const slope = requireFinite('surfaceTensionSlope', input.surfaceTensionSlope, 'N/(m·K)');
  const dT = requirePositive('temperatureDifference', input.temperatureDifference, 'K', { allowZero: true });
  const length = requirePositive('length', input.length, 'm');
  const rho = requirePositive('density', input.density, 'kg/m³');
  const mu = requirePositive('viscosity', input.viscosity, 'Pa·s');
  const surfaceStress = (Math.abs(slope) * dT) / length;
  const velocity = Math.cbrt((surfaceStress * surfaceStress * length) / (rho * mu));
  const boundaryLayerThickness = velocity > 0 ? Math.sqrt((mu * length) / (rho * velocity)) : Number.POSITIVE_INFINITY;
  return Object.freeze({ surfaceStress, velocity, boundaryLayerThickness });
}
