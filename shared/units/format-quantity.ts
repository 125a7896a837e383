import { formatSignificant } from './format-significant';
import { fromSi } from './from-si';
import type { QuantityKind } from './quantity-kinds';

/**
 * Write an SI value of a quantity kind in a chosen unit, e.g. `0.035` N/m as `"35.00 mN/m"`.
 *
 * ## Method
 * Convert with {@link fromSi} (absolute temperature versus difference kept apart), round to the
 * requested significant digits with {@link formatSignificant}, and append the unit as given.
 *
 * ## References
 * - Thompson A., Taylor B. N. (2008) NIST Special Publication 811, §7.1 (a space between number and
 *   unit) and §10.5 (rounding).
 *
 * @param si - the value in the kind's SI unit
 * @param kind - the quantity kind
 * @param unit - the unit to show, e.g. `"mN/m"`, `"°F"`
 * @param significantDigits - significant digits, default 4
 * @returns the value and unit as text
 * @throws UnitError for an unknown or unfitting unit or a non-finite value
 * @example formatQuantity(293.15, 'temperature', '°F') // '68.00 °F'
 */
export function formatQuantity(si: number, kind: QuantityKind, unit: string, significantDigits = 4): string {
  return `${formatSignificant(fromSi(si, unit, kind), significantDigits)} ${unit}`;
}
