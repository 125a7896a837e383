import { deltaTFromHeatFlux } from './delta-t-from-heat-flux';
import { evaporativeHeatFlux } from './evaporative-heat-flux';

/**
 * Temperature drop across an evaporating liquid layer, ΔT = ṁ L d / k.
 *
 * ## Method
 * In the steady (quasi-steady) state the latent heat taken at the surface, q = ṁ L
 * ({@link evaporativeHeatFlux}), is conducted up through the liquid from the substrate, so by
 * Fourier's law ({@link deltaTFromHeatFlux}) ΔT = q d/k = ṁ L d/k, the surface being colder than the
 * bottom (ΔT > 0, the destabilising sense for ordinary liquids). Convective exchange with the air at
 * the surface is neglected here; add it through {@link deltaTFromSurfaceTemperatures} when it matters.
 *
 * ## References
 * - Bergman T. L. et al. (2011) "Fundamentals of Heat and Mass Transfer", 7th ed., eq. 3.3 and eq. 6.62.
 *
 * @param input.evaporationFlux - ṁ [kg/(m²·s)]
 * @param input.latentHeat - L [J/kg], > 0
 * @param input.depth - d [m], > 0
 * @param input.conductivity - k [W/(m·K)], > 0
 * @returns ΔT, bottom minus surface [K]
 * @example deltaTFromEvaporation({ evaporationFlux: 1e-3, latentHeat: 4e5, depth: 1e-4, conductivity: 0.2 }) // 0.2
 */
export function deltaTFromEvaporation(input: {
  evaporationFlux: number;
  latentHeat: number;
  depth: number;
  conductivity: number;
}): number {
  const heatFlux = evaporativeHeatFlux({ evaporationFlux: input.evaporationFlux, latentHeat: input.latentHeat });
  return deltaTFromHeatFlux({ heatFlux, depth: input.depth, conductivity: input.conductivity });
}
