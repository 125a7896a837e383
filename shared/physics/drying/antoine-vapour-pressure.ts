import { requirePositive } from '../groups/require-positive';
import { requireFinite } from '../groups/require-finite';

/**
 * Saturation vapour pressure of a pure liquid from the Antoine equation in the form the NIST
 * Chemistry WebBook tabulates.
 *
 * ## Method
 * log₁₀(p/bar) = A − B/(T/K + C), returned in Pa (1 bar = 10⁵ Pa exactly). The constants hold only
 * over the temperature range they were fitted on; outside it the caller must decide (the Drying
 * path flags it, see validRange).
 *
 * ## References
 * - Antoine C. (1888) "Tensions des vapeurs; nouvelle relation entre les tensions et les
 *   températures", C. R. Acad. Sci. Paris 107:681–684, 778–780, 836–837.
 * - Linstrom P.J., Mallard W.G. (eds.) NIST Chemistry WebBook, NIST Standard Reference Database 69,
 *   "Phase change data" (Antoine parameters). doi:10.18434/T4D303
 *
 * @param temperature - absolute temperature T [K], > 0 and ≠ −C
 * @param constants - A [-], B [K], C [K] for p in bar and T in K
 * @returns saturation vapour pressure [Pa]
 * @example antoineVapourPressure(383.75, { a: 4.07827, b: 1343.943, c: -53.773 })
 * // ≈ 101 260 (toluene at its normal boiling point; NIST WebBook constants)
 */
export function antoineVapourPressure(temperature: number, constants: { a: number; b: number; c: number }): number {
  const t = requirePositive('temperature', temperature, 'K');
  const a = requireFinite('antoine.a', constants.a, '-');
  const b = requireFinite('antoine.b', constants.b, 'K');
  const c = requireFinite('antoine.c', constants.c, 'K');
  if (!(t + c > 0)) throw new RangeError(`temperature + antoine.c must be > 0 K, got ${t + c}`);
  return 1e5 * 10 ** (a - b / (t + c));
}
