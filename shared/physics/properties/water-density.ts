import { CELSIUS_ZERO_KELVIN } from '../../units/constants';
import { requirePositive } from '../groups/require-positive';

/**
 * Density of air-free liquid water at atmospheric pressure (101.325 kPa), Kell's correlation.
 *
 * ## Method
 * ρ = (999.83952 + 16.945176 t − 7.9870401×10⁻³ t² − 46.170461×10⁻⁶ t³ + 105.56302×10⁻⁹ t⁴
 * − 280.54253×10⁻¹² t⁵) / (1 + 16.879850×10⁻³ t) kg/m³, t in °C. Kell fitted it on the 1968
 * temperature scale; the IPTS-68/ITS-90 difference (≈ 5 mK near 20 °C) changes ρ by < 1 ppm and is
 * ignored. Valid 0–100 °C here (liquid at 1 atm); stated fit within a few ppm.
 *
 * ## References
 * - Kell G. S. (1975) "Density, thermal expansivity, and compressibility of liquid water from 0° to
 *   150 °C: correlations and tables for atmospheric pressure and saturation reviewed and expressed on
 *   1968 temperature scale", J. Chem. Eng. Data 20(1), 97–105. doi:10.1021/je60064a005
 *
 * @param temperature - absolute temperature [K], 273.15–373.15
 * @returns density [kg/m³]
 * @example waterDensity(277.15) // ≈ 999.972
 */
export function waterDensity(temperature: number): number {
  const T = requirePositive('temperature', temperature, 'K');
  if (T < CELSIUS_ZERO_KELVIN || T > CELSIUS_ZERO_KELVIN + 100) {
    throw new RangeError(`temperature must be within 273.15–373.15 K for liquid water at 1 atm, got ${T} K`);
  }
  const t = T - CELSIUS_ZERO_KELVIN;
  const numerator =
    999.83952 + 16.945176 * t - 7.9870401e-3 * t ** 2 - 46.170461e-6 * t ** 3 + 105.56302e-9 * t ** 4 - 280.54253e-12 * t ** 5;
  return numerator / (1 + 16.87985e-3 * t);
}
