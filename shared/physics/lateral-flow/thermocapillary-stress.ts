import { requireFinite } from '../groups/require-finite';
import { requirePositive } from '../groups/require-positive';

/**
 * Thermocapillary shear stress on a surface with a temperature difference ΔT along a distance L,
 * τ = |dσ/dT|·ΔT/L.
 *
 * ## Method
 * The surface-tension gradient dσ/dx = (dσ/dT)(dT/dx) is a shear stress on the liquid surface
 * (tangential stress balance), pulling liquid toward higher σ, i.e. toward the cold side for ordinary
 * liquids (dσ/dT < 0) and toward the hot side when dσ/dT > 0. Linear σ(T) and a uniform gradient
 * ΔT/L are assumed. The magnitude is returned; the direction follows from the sign of dσ/dT.
 *
 * ## References
 * - Smith M. K., Davis S. H. (1983) "Instabilities of dynamic thermocapillary liquid layers. Part 1.
 *   Convective instabilities", J. Fluid Mech. 132, 119–144. doi:10.1017/S0022112083001512
 *
 * @param input.surfaceTensionSlope - dσ/dT [N/(m·K)]
 * @param input.temperatureDifference - ΔT along the surface [K], ≥ 0
 * @param input.length - distance L over which ΔT acts [m], > 0
 * @returns surface shear stress magnitude τ [Pa]
 * @example thermocapillaryStress({ surfaceTensionSlope: -1e-4, temperatureDifference: 10, length: 0.01 }) // 0.1
 */
export function thermocapillaryStress(input: { surfaceTensionSlope: number; temperatureDifference: number; length: number }): number {
  const slope = requireFinite('surfaceTensionSlope', input.surfaceTensionSlope, 'N/(m·K)');
  const dT = requirePositive('temperatureDifference', input.temperatureDifference, 'K', { allowZero: true });
  const L = requirePositive('length', input.length, 'm');
  return (Math.abs(slope) * dT) / L;
}
