import { requirePositive } from './require-positive';

/**
 * Thermal diffusivity of a liquid, κ = k/(ρ c_p).
 *
 * ## Method
 * Definition of the thermal diffusivity; valid for any material with constant properties.
 *
 * ## References
 * - Bergman T. L., Lavine A. S., Incropera F. P., DeWitt D. P. (2011) "Fundamentals of Heat and Mass
 *   Transfer", 7th ed., Wiley, eq. 2.22.
 *
 * @param input.conductivity - thermal conductivity k [W/(m·K)], > 0
 * @param input.density - density ρ [kg/m³], > 0
 * @param input.heatCapacity - specific heat capacity c_p [J/(kg·K)], > 0
 * @returns thermal diffusivity κ [m²/s]
 * @example thermalDiffusivity({ conductivity: 0.598, density: 998.2, heatCapacity: 4182 }) // ≈ 1.433e-7
 */
export function thermalDiffusivity(input: { conductivity: number; density: number; heatCapacity: number }): number {
  const k = requirePositive('conductivity', input.conductivity, 'W/(m·K)');
  const rho = requirePositive('density', input.density, 'kg/m³');
  const cp = requirePositive('heatCapacity', input.heatCapacity, 'J/(kg·K)');
  return k / (rho * cp);
}
