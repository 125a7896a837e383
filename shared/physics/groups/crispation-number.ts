import { requirePositive } from './require-positive';

/**
 * Crispation (capillary) number of a layer, Cr = μ κ / (σ d).
 *
 * ## Method
 * Measures how easily the free surface deflects under the thermocapillary flow; Cr → 0 is a flat
 * surface. Thin, viscous films have the largest Cr.
 *
 * ## References
 * - Scriven L. E., Sternling C. V. (1964) "On cellular convection driven by surface-tension gradients:
 *   effects of mean surface tension and surface viscosity", J. Fluid Mech. 19, 321–340.
 *   doi:10.1017/S0022112064000751
 * - Davis S. H. (1987) Annu. Rev. Fluid Mech. 19, 403–435.
 *
 * @param input.viscosity - μ [Pa·s], > 0
 * @param input.thermalDiffusivity - κ [m²/s], > 0
 * @param input.surfaceTension - σ [N/m], > 0
 * @param input.depth - d [m], > 0
 * @returns crispation number [-]
 * @example crispationNumber({ viscosity: 1e-2, thermalDiffusivity: 1e-7, surfaceTension: 0.025, depth: 1e-4 }) // 4e-4
 */
export function crispationNumber(input: {
  viscosity: number;
  thermalDiffusivity: number;
  surfaceTension: number;
  depth: number;
}): number {
  const mu = requirePositive('viscosity', input.viscosity, 'Pa·s');
  const kappa = requirePositive('thermalDiffusivity', input.thermalDiffusivity, 'm²/s');
  const sigma = requirePositive('surfaceTension', input.surfaceTension, 'N/m');
  const d = requirePositive('depth', input.depth, 'm');
  return (mu * kappa) / (sigma * d);
}
