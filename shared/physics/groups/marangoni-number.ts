import { requireFinite } from './require-finite';
import { requirePositive } from './require-positive';

/**
 * Thermal Marangoni number of a horizontal layer, Ma = (−dσ/dT) ΔT d / (μ κ).
 *
 * ## Method
 * Ratio of thermocapillary surface stress to viscous and thermal damping. For ordinary liquids
 * dσ/dT < 0, so Ma > 0 when the bottom is hotter; Ma < 0 when heated from above or when
 * dσ/dT > 0 (e.g. steel with much sulfur). Linear σ(T) over ΔT assumed.
 *
 * ## References
 * - Pearson J. R. A. (1958) "On convection cells induced by surface tension", J. Fluid Mech. 4,
 *   489–500. doi:10.1017/S0022112058000616
 *
 * @param input.surfaceTensionSlope - dσ/dT [N/(m·K)], negative for ordinary liquids
 * @param input.deltaT - temperature drop across the layer ΔT [K], bottom minus top
 * @param input.depth - layer depth d [m], > 0
 * @param input.viscosity - dynamic viscosity μ [Pa·s], > 0
 * @param input.thermalDiffusivity - κ [m²/s], > 0
 * @returns Marangoni number [-]
 * @example marangoniNumber({ surfaceTensionSlope: -1e-4, deltaT: 1, depth: 1e-3, viscosity: 1e-2, thermalDiffusivity: 1e-7 }) // 100
 */
export function marangoniNumber(input: {
  surfaceTensionSlope: number;
  deltaT: number;
  depth: number;
  viscosity: number;
  thermalDiffusivity: number;
}): number {
  const slope = requireFinite('surfaceTensionSlope', input.surfaceTensionSlope, 'N/(m·K)');
  const dT = requireFinite('deltaT', input.deltaT, 'K');
  const d = requirePositive('depth', input.depth, 'm');
  const mu = requirePositive('viscosity', input.viscosity, 'Pa·s');
  const kappa = requirePositive('thermalDiffusivity', input.thermalDiffusivity, 'm²/s');
  return (-slope * dT * d) / (mu * kappa);
}
