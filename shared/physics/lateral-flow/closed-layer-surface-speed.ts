import { closedLayerVelocity } from './closed-layer-velocity';

/**
 * Surface speed of a thin closed layer (return flow, no net flux) under a surface stress τ, u_s = τ d/(4μ).
 *
 * ## Method
 * The return-flow profile of {@link closedLayerVelocity} evaluated at the surface ζ = 1:
 * (τ d/μ)(¾ − ½) = τ d/(4μ), a quarter of the open-film value. Lubrication approximation (d ≪ L).
 *
 * ## References
 * - Smith M. K., Davis S. H. (1983) J. Fluid Mech. 132, 119–144. doi:10.1017/S0022112083001512
 *
 * @param input.stress - surface shear stress τ [Pa], ≥ 0
 * @param input.depth - layer depth d [m], > 0
 * @param input.viscosity - μ [Pa·s], > 0
 * @returns surface speed [m/s]
 * @example closedLayerSurfaceSpeed({ stress: 0.1, depth: 1e-3, viscosity: 0.01 }) // 0.0025
 */
export function closedLayerSurfaceSpeed(input: { stress: number; depth: number; viscosity: number }): number {
  return closedLayerVelocity({ ...input, height: input.depth });
}
