import { requireFinite } from './require-finite';
import { requirePositive } from './require-positive';

/**
 * Solutal Marangoni number of a layer, Ma_c = (−dσ/dc) Δc d / (μ D).
 *
 * ## Method
 * The concentration analogue of the thermal Marangoni number: solute (or solvent) content c plays the
 * part of temperature and its diffusivity D that of κ; Δc is the content difference from the bottom
 * to the surface (positive when the bottom is richer in the component whose excess lowers σ more,
 * i.e. the sign convention mirrors ΔT). By this analogy QuietLayer feeds Ma_c, with a mass-transfer
 * Biot number h_m d/D, to the same onset solver as the thermal problem. The analogy holds for a
 * stationary base state with linear σ(c); it neglects the change of depth and properties as the film
 * dries, so treat margins from it as indicative.
 *
 * ## References
 * - Sternling C. V., Scriven L. E. (1959) "Interfacial turbulence: hydrodynamic instability and the
 *   Marangoni effect", AIChE J. 5(4), 514–523. doi:10.1002/aic.690050421
 * - Tönsmann M., Scharfer P., Schabel W. (2021) "Critical solutal Marangoni number correlation for
 *   short-scale convective instabilities in drying poly(vinyl acetate)-methanol thin films",
 *   Polymers 13(17), 2955. doi:10.3390/polym13172955
 *
 * @param input.surfaceTensionConcentrationSlope - dσ/dc [N/m per unit of c]
 * @param input.concentrationDifference - Δc, bottom minus surface [unit of c]
 * @param input.depth - d [m], > 0
 * @param input.viscosity - μ [Pa·s], > 0
 * @param input.diffusivity - solute diffusivity D [m²/s], > 0
 * @returns solutal Marangoni number [-]
 * @example solutalMarangoniNumber({ surfaceTensionConcentrationSlope: -0.015, concentrationDifference: 0.05, depth: 50e-6, viscosity: 0.01, diffusivity: 1e-10 }) // ≈ 37500
 */
export function solutalMarangoniNumber(input: {
  surfaceTensionConcentrationSlope: number;
  concentrationDifference: number;
  depth: number;
  viscosity: number;
  diffusivity: number;
}): number {
  const slope = requireFinite('surfaceTensionConcentrationSlope', input.surfaceTensionConcentrationSlope, 'N/m per unit c');
  const dc = requireFinite('concentrationDifference', input.concentrationDifference, 'unit c');
  const d = requirePositive('depth', input.depth, 'm');
  const mu = requirePositive('viscosity', input.viscosity, 'Pa·s');
  const D = requirePositive('diffusivity', input.diffusivity, 'm²/s');
  return (-slope * dc * d) / (mu * D);
}
