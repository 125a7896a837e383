import { requireFinite } from '../groups/require-finite';
import { requirePositive } from '../groups/require-positive';

/**
 * Heat drawn from a liquid surface by evaporation, q = ṁ L.
 *
 * ## Method
 * Energy balance on the surface: each kilogram evaporated takes its latent heat of vaporisation
 * with it. Sensible heat carried by the vapour is neglected (small next to L for solvents and water).
 *
 * ## References
 * - Bergman T. L. et al. (2011) "Fundamentals of Heat and Mass Transfer", 7th ed., §6.7.2,
 *   eq. 6.62 (q″_evap = n″_A h_fg).
 *
 * @param input.evaporationFlux - mass evaporated per area and time ṁ [kg/(m²·s)]
 * @param input.latentHeat - latent heat of vaporisation L [J/kg], > 0
 * @returns evaporative heat flux [W/m²]
 * @example evaporativeHeatFlux({ evaporationFlux: 1e-3, latentHeat: 4e5 }) // 400
 */
export function evaporativeHeatFlux(input: { evaporationFlux: number; latentHeat: number }): number {
  const m = requireFinite('evaporationFlux', input.evaporationFlux, 'kg/(m²·s)');
  const L = requirePositive('latentHeat', input.latentHeat, 'J/kg');
  return m * L;
}
