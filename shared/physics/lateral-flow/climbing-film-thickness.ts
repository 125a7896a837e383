import { requirePositive } from '../groups/require-positive';

/**
 * Thickness below which a surface-tension gradient can drag a film up a vertical wall against
 * gravity, h* = Δσ/(ρ g L).
 *
 * ## Method
 * Force balance per unit area of wall: the Marangoni stress τ = Δσ/L pulling up against the film's
 * weight ρ g h. The film climbs when ρ g h < τ. This is the scaling estimate; the lubrication flux
 * Q = τh²/(2μ) − ρ g h³/(3μ) is upward for h < 3τ/(2ρg), i.e. 1.5 h*, so read h* as the order of
 * magnitude, not a sharp limit.
 *
 * ## References
 * - Fanton X., Cazabat A. M., Quéré D. (1996) "Thickness and shape of films driven by a Marangoni
 *   flow", Langmuir 12(24), 5875–5880. doi:10.1021/la960474m
 * - Cazabat A. M., Heslot F., Troian S. M., Carles P. (1990) "Fingering instability of thin spreading
 *   films driven by temperature gradients", Nature 346, 824–826. doi:10.1038/346824a0
 *
 * @param input.surfaceTensionDifference - Δσ along the wall [N/m], ≥ 0
 * @param input.density - ρ [kg/m³], > 0
 * @param input.gravity - g [m/s²], > 0
 * @param input.length - height L over which Δσ acts [m], > 0
 * @returns limiting film thickness [m]
 * @example climbingFilmThickness({ surfaceTensionDifference: 0.05, density: 1000, gravity: 9.80665, length: 0.05 }) // ≈ 1.02e-4
 */
export function climbingFilmThickness(input: {
  surfaceTensionDifference: number;
  density: number;
  gravity: number;
  length: number;
}): number {
  const dSigma = requirePositive('surfaceTensionDifference', input.surfaceTensionDifference, 'N/m', { allowZero: true });
  const rho = requirePositive('density', input.density, 'kg/m³');
  const g = requirePositive('gravity', input.gravity, 'm/s²');
  const L = requirePositive('length', input.length, 'm');
  return dSigma / (rho * g * L);
}
