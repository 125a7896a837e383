import { requireFinite } from '../groups/require-finite';
import { requirePositive } from '../groups/require-positive';

/**
 * Density varying linearly with temperature through the expansion coefficient,
 * ρ(T) = ρ_ref·[1 − β (T − T_ref)].
 *
 * ## Method
 * First-order expansion of ρ(T) about T_ref with β = −(1/ρ)(∂ρ/∂T)_p, the form used in the Boussinesq
 * approximation. Valid while β|T − T_ref| ≪ 1; a result ≤ 0 is refused.
 *
 * ## References
 * - Tritton D. J. (1988) "Physical Fluid Dynamics", 2nd ed., Oxford, §14.2 (Boussinesq approximation).
 * - Chandrasekhar S. (1961) "Hydrodynamic and Hydromagnetic Stability", Oxford, ch. II §8.
 *
 * @param law.referenceDensity - ρ_ref [kg/m³], > 0
 * @param law.referenceTemperature - T_ref [K], > 0
 * @param law.expansion - β [1/K]
 * @param temperature - T [K], > 0
 * @returns density [kg/m³]
 * @example linearDensity({ referenceDensity: 1000, referenceTemperature: 293.15, expansion: 2e-4 }, 303.15) // 998
 */
export function linearDensity(
  law: { referenceDensity: number; referenceTemperature: number; expansion: number },
  temperature: number,
): number {
  const rho = requirePositive('referenceDensity', law.referenceDensity, 'kg/m³');
  const tRef = requirePositive('referenceTemperature', law.referenceTemperature, 'K');
  const beta = requireFinite('expansion', law.expansion, '1/K');
  const T = requirePositive('temperature', temperature, 'K');
  const result = rho * (1 - beta * (T - tRef));
  if (!(result > 0)) throw new RangeError(`temperature ${T} K is outside the linear density law (density would be ${result} kg/m³)`);
  return result;
}
