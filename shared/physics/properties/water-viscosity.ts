import { waterDensity } from './water-density';
import { waterViscosityFromDensity } from './water-viscosity-from-density';

/**
 * Viscosity of liquid water at atmospheric pressure (≈ 0.1 MPa), from its temperature.
 *
 * ## Method
 * IAPWS 2008 dilute-gas and residual parts ({@link waterViscosityFromDensity}) evaluated at the
 * density of air-free water at 1 atm from Kell's correlation ({@link waterDensity}) in place of the
 * IAPWS-95 equation of state; Kell's density agrees with IAPWS-95 to a few ppm over 0–100 °C, far
 * inside the 1 % uncertainty of the viscosity formulation. Valid 0–100 °C.
 *
 * ## References
 * - IAPWS (2008) IAPWS R12-08, Release on the IAPWS Formulation 2008 for the Viscosity of Ordinary
 *   Water Substance (Table 4 lists 1.0016 mPa·s at 20 °C, 0.1 MPa).
 * - Huber M. L. et al. (2009) J. Phys. Chem. Ref. Data 38(2), 101–125. doi:10.1063/1.3088050
 * - Kell G. S. (1975) J. Chem. Eng. Data 20(1), 97–105. doi:10.1021/je60064a005
 *
 * @param temperature - absolute temperature [K], 273.15–373.15
 * @returns dynamic viscosity [Pa·s]
 * @example waterViscosity(293.15) // ≈ 1.0016e-3
 */
export function waterViscosity(temperature: number): number {
  return waterViscosityFromDensity(temperature, waterDensity(temperature));
}
