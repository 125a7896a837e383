import { requirePositive } from '../groups/require-positive';

/**
 * Time a point on the web spends in one oven zone.
 *
 * ## Method
 * t = L / v, zone length over line speed (plug motion of the web, no slip).
 *
 * ## References
 * - Definition of residence time for a conveyed web; see Hung J.Y., Wimberger R.J., Mujumdar A.S.,
 *   "Drying of coated webs", in Mujumdar A.S. (ed.) Handbook of Industrial Drying, ch. 40.
 *
 * @param zoneLength - zone length along the web [m], > 0
 * @param lineSpeed - web speed [m/s], > 0
 * @returns residence time [s]
 * @example zoneResidenceTime(6.1, 91 / 60) // ≈ 4.022
 */
export function zoneResidenceTime(zoneLength: number, lineSpeed: number): number {
  const l = requirePositive('zoneLength', zoneLength, 'm');
  const v = requirePositive('lineSpeed', lineSpeed, 'm/s');
  return l / v;
}
