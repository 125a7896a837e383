import { quantityKinds, type QuantityKind, type SiValue } from './quantity-kinds';
import { resolveUnit } from './resolve-unit';
import { UnitError } from './unit-error';
import { unitMath } from './unit-math';

/**
 * Convert a value in a named unit to the SI unit of its quantity kind.
 *
 * ## Method
 * Conversion factors come from the units library's unit definitions (exact where the definitions are
 * exact, e.g. 1 in = 0.0254 m, 1 dyn = 10⁻⁵ N). An absolute temperature keeps the scale offset
 * (T/K = t/°C + 273.15; T/K = (t/°F + 459.67)·5/9). A temperature *difference* is converted as the
 * size of one degree found as the difference of two conversions (1 and 0 in that unit), which drops
 * the offset: 1 °F = 5/9 K.
 * Absolute temperatures at or below 0 K are refused.
 *
 * ## References
 * - Thompson A., Taylor B. N. (2008) "Guide for the Use of the International System of Units (SI)",
 *   NIST Special Publication 811, Appendix B (factors) and §B.8 (temperature intervals).
 *
 * @param value - the number in `unitText` units
 * @param unitText - the unit as typed, e.g. `"°F"`
 * @param kind - the quantity kind
 * @returns the value in the kind's SI unit
 * @throws UnitError for unknown or unfitting units, non-finite values or temperatures ≤ 0 K
 * @example toSi(9, '°F', 'temperatureDifference') // 5
 */
export function toSi<K extends QuantityKind>(value: number, unitText: string, kind: K): SiValue<K> {
  const info = quantityKinds[kind];
  if (!Number.isFinite(value)) {
    throw new UnitError(info.label, String(value), info.units, `value must be a finite number, got ${value}`);
  }
  const { normalized } = resolveUnit(unitText, kind);
  let si: number;
  if (kind === 'temperatureDifference') {
    // Size of one degree of the unit (difference of two conversions), then scale: subtracting the
    // converted value and zero directly would lose digits to the offset for small differences.
    const degree = unitMath.unit(1, normalized).toNumber('K') - unitMath.unit(0, normalized).toNumber('K');
    si = value * degree;
  } else {
    si = unitMath.unit(value, normalized).toNumber(info.siUnit);
  }
  if (kind === 'temperature' && !(si > 0)) {
    throw new UnitError(info.label, `${value} ${unitText}`, info.units, `${value} ${unitText} is at or below absolute zero`);
  }
  return si as SiValue<K>;
}
