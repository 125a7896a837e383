import { requireFinite } from './require-finite';
import { requirePositive } from './require-positive';

/**
 * Rayleigh number of a horizontal layer, Ra = g β ΔT d³ / (ν κ).
 *
 * ## Method
 * Ratio of buoyant driving to viscous and thermal damping in the Boussinesq approximation; ΔT is the
 * drop across the liquid (positive when the bottom is hotter), so Ra < 0 means heated from above.
 * Valid while βΔT ≪ 1 (Boussinesq).
 *
 * ## References
 * - Lord Rayleigh (1916) "On convective currents in a horizontal layer of fluid, when the higher
 *   temperature is on the under side", Phil. Mag. 32(192), 529–546. doi:10.1080/14786441608635602
 * - Chandrasekhar S. (1961) "Hydrodynamic and Hydromagnetic Stability", Oxford, ch. II §8.
 *
 * @param input.gravity - gravitational acceleration g [m/s²], ≥ 0
 * @param input.expansion - volumetric expansion coefficient β [1/K] (may be negative, e.g. water < 4 °C)
 * @param input.deltaT - temperature drop across the layer ΔT [K], bottom minus top
 * @param input.depth - layer depth d [m], > 0
 * @param input.kinematicViscosity - ν [m²/s], > 0
 * @param input.thermalDiffusivity - κ [m²/s], > 0
 * @returns Rayleigh number [-]
 * @example rayleighNumber({ gravity: 9.81, expansion: 2e-4, deltaT: 1, depth: 0.01, kinematicViscosity: 1e-6, thermalDiffusivity: 1.4e-7 }) // ≈ 14014
 */
export function rayleighNumber(input: {
  gravity: number;
  expansion: number;
  deltaT: number;
  depth: number;
  kinematicViscosity: number;
  thermalDiffusivity: number;
}): number {
  const g = requirePositive('gravity', input.gravity, 'm/s²', { allowZero: true });
  const beta = requireFinite('expansion', input.expansion, '1/K');
  const dT = requireFinite('deltaT', input.deltaT, 'K');
  const d = requirePositive('depth', input.depth, 'm');
  const nu = requirePositive('kinematicViscosity', input.kinematicViscosity, 'm²/s');
  const kappa = requirePositive('thermalDiffusivity', input.thermalDiffusivity, 'm²/s');
  return (g * beta * dT * d ** 3) / (nu * kappa);
}
