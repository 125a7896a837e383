import { requirePositive } from '../groups/require-positive';

/** IAPWS R1-76(2014) constants: B [N/m], b [-], μ [-], critical temperature T_c [K]. */
const B = 0.2358;
const SMALL_B = -0.625;
const MU = 1.256;
const CRITICAL_TEMPERATURE = 647.096;

/**
 * Surface tension of ordinary water against its vapour (or air), IAPWS R1-76(2014).
 *
 * ## Method
 * σ = B τ^μ (1 + b τ), τ = 1 − T/T_c, with B = 235.8 mN/m, b = −0.625, μ = 1.256, T_c = 647.096 K.
 * Valid from the triple point (273.16 K) to T_c; IAPWS states it also extrapolates sensibly into
 * supercooled water down to 248.15 K, which is the lower limit accepted here. Stated uncertainty
 * about 0.5 % at 20 °C (IAPWS Table 1 gives the full band).
 *
 * ## References
 * - IAPWS (2014) "Revised Release on Surface Tension of Ordinary Water Substance", IAPWS R1-76(2014),
 *   International Association for the Properties of Water and Steam.
 * - Vargaftik N. B., Volkov B. N., Voljak L. D. (1983) "International tables of the surface tension of
 *   water", J. Phys. Chem. Ref. Data 12(3), 817–820. doi:10.1063/1.555688
 *
 * @param temperature - absolute temperature T [K], 248.15 ≤ T < 647.096
 * @returns surface tension σ [N/m]
 * @example waterSurfaceTension(293.15) // ≈ 0.07274
 */
export function waterSurfaceTension(temperature: number): number {
  const T = requirePositive('temperature', temperature, 'K');
  if (T < 248.15 || T >= CRITICAL_TEMPERATURE) {
    throw new RangeError(`temperature must be within 248.15–647.096 K for IAPWS R1-76, got ${T} K`);
  }
  const tau = 1 - T / CRITICAL_TEMPERATURE;
  return B * tau ** MU * (1 + SMALL_B * tau);
}
