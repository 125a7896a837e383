import { fromSi } from './from-si';
import type { QuantityKind } from './quantity-kinds';
import { toSi } from './to-si';

/**
 * Convert a value of one quantity kind from one unit to another (through SI).
 *
 * ## Method
 * `fromSi(toSi(value, from), to)`; see {@link toSi} for how absolute temperatures and temperature
 * differences are kept apart.
 *
 * ## References
 * - Thompson A., Taylor B. N. (2008) NIST Special Publication 811, Appendix B.
 *
 * @param value - the number in `fromUnit`
 * @param fromUnit - the unit it is in, e.g. `"cSt"`
 * @param toUnit - the unit wanted, e.g. `"m²/s"`
 * @param kind - the quantity kind both units measure
 * @returns the value in `toUnit`
 * @throws UnitError for unknown or unfitting units
 * @example convertQuantity(1, 'mil', 'µm', 'length') // ≈ 25.4
 */
export function convertQuantity(value: number, fromUnit: string, toUnit: string, kind: QuantityKind): number {
  return fromSi(toSi(value, fromUnit, kind), toUnit, kind);
}
