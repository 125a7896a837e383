import { requireFinite } from '../groups/require-finite';
import { requirePositive } from '../groups/require-positive';

/**
 * Surface tension varying linearly with temperature, σ(T) = σ_ref + (dσ/dT)(T − T_ref).
 *
 * ## Method
 * First-order expansion of σ(T) about T_ref; for most liquids σ falls nearly linearly well below the
 * critical point (Eötvös), which is also the assumption behind the Marangoni number. A result ≤ 0 is
 * refused.
 *
 * ## References
 * - Adamson A. W., Gast A. P. (1997) "Physical Chemistry of Surfaces", 6th ed., Wiley, §III-2B
 *   (temperature dependence, Eötvös and Ramsay–Shields).
 * - Pearson J. R. A. (1958) J. Fluid Mech. 4, 489–500. doi:10.1017/S0022112058000616
 *
 * @param law.referenceSurfaceTension - σ_ref [N/m], > 0
 * @param law.referenceTemperature - T_ref [K], > 0
 * @param law.slope - dσ/dT [N/(m·K)]
 * @param temperature - T [K], > 0
 * @returns surface tension [N/m]
 * @example linearSurfaceTension({ referenceSurfaceTension: 0.025, referenceTemperature: 293.15, slope: -1e-4 }, 313.15) // 0.023
 */
export function linearSurfaceTension(
  law: { referenceSurfaceTension: number; referenceTemperature: number; slope: number },
  temperature: number,
): number {
  const sigma = requirePositive('referenceSurfaceTension', law.referenceSurfaceTension, 'N/m');
  const tRef = requirePositive('referenceTemperature', law.referenceTemperature, 'K');
  const slope = requireFinite('slope', law.slope, 'N/(m·K)');
  const T = requirePositive('temperature', temperature, 'K');
  const result = sigma + slope * (T - tRef);
  if (!(result > 0)) throw new RangeError(`temperature ${T} K is outside the linear surface-tension law (σ would be ${result} N/m)`);
  return result;
}
