import { requirePositive } from '../groups/require-positive';

const B = 0.2358;
const SMALL_B = -0.625;
const MU = 1.256;
const CRITICAL_TEMPERATURE = 647.096;

/**
 * Temperature slope dσ/dT of water's surface tension, from IAPWS R1-76(2014).
 *
 * ## Method
 * Analytic derivative of σ = B τ^μ (1 + bτ), τ = 1 − T/T_c:
 * dσ/dT = −(B/T_c)·[μ τ^(μ−1)(1 + bτ) + b τ^μ]. Same validity as {@link waterSurfaceTension}.
 *
 * ## References
 * - IAPWS (2014) "Revised Release on Surface Tension of Ordinary Water Substance", IAPWS R1-76(2014).
 *
 * @param temperature - absolute temperature T [K], 248.15 ≤ T < 647.096
 * @returns dσ/dT [N/(m·K)] (negative)
 * @example waterSurfaceTensionSlope(298.15) // ≈ −1.542e-4
 */
export function waterSurfaceTensionSlope(temperature: number): number {
  const T = requirePositive('temperature', temperature, 'K');
  if (T < 248.15 || T >= CRITICAL_TEMPERATURE) {
    throw new RangeError(`temperature must be within 248.15–647.096 K for IAPWS R1-76, got ${T} K`);
  }
  const tau = 1 - T / CRITICAL_TEMPERATURE;
  return -(B / CRITICAL_TEMPERATURE) * (MU * tau ** (MU - 1) * (1 + SMALL_B * tau) + SMALL_B * tau ** MU);
}
