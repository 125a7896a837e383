import { requirePositive } from './require-positive';

/**
 * Static Bond number of a layer, Bo = ρ g d² / σ.
 *
 * ## Method
 * Ratio of hydrostatic to capillary pressure over the depth; with the crispation number it sets the
 * deformable-surface (long-wave) threshold, Ma_LW = (2/3)·(Bo/Cr)·(1 + Bi).
 *
 * ## References
 * - Davis S. H. (1987) "Thermocapillary instabilities", Annu. Rev. Fluid Mech. 19, 403–435.
 *   doi:10.1146/annurev.fl.19.010187.002155
 *
 * @param input.density - ρ [kg/m³], > 0
 * @param input.gravity - g [m/s²], ≥ 0
 * @param input.depth - d [m], > 0
 * @param input.surfaceTension - σ [N/m], > 0
 * @returns Bond number [-]
 * @example bondNumber({ density: 1000, gravity: 9.81, depth: 1e-3, surfaceTension: 0.07 }) // ≈ 0.140
 */
export function bondNumber(input: { density: number; gravity: number; depth: number; surfaceTension: number }): number {
  const rho = requirePositive('density', input.density, 'kg/m³');
  const g = requirePositive('gravity', input.gravity, 'm/s²', { allowZero: true });
  const d = requirePositive('depth', input.depth, 'm');
  const sigma = requirePositive('surfaceTension', input.surfaceTension, 'N/m');
  return (rho * g * d * d) / sigma;
}
