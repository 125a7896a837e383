import { quantityKinds, type QuantityKind } from './quantity-kinds';
import { resolveUnit } from './resolve-unit';
import { UnitError } from './unit-error';
import { unitMath } from './unit-math';

/**
 * Convert an SI value of a quantity kind into a named unit.
 *
 * ## Method
 * The inverse of {@link toSi}: library unit definitions for the factor; the scale offset only for
 * absolute temperatures; a temperature difference is divided by the size of one degree of the
 * target unit (1 K, 1 °C or 5/9 K for 1 °F).
 *
 * ## References
 * - Thompson A., Taylor B. N. (2008) NIST Special Publication 811, Appendix B and §B.8.
 *
 * @param si - the value in the kind's SI unit
 * @param unitText - the target unit, e.g. `"mN/m"`
 * @param kind - the quantity kind
 * @returns the value in `unitText` units
 * @throws UnitError for unknown or unfitting units or a non-finite value
 * @example fromSi(293.15, '°F', 'temperature') // ≈ 68
 */
export function fromSi(si: number, unitText: string, kind: QuantityKind): number {
  const info = quantityKinds[kind];
  if (!Number.isFinite(si)) {
    throw new UnitError(info.label, String(si), info.units, `value must be a finite number, got ${si}`);
  }
  const { normalized } = resolveUnit(unitText, kind);
  if (kind === 'temperatureDifference') {
    const degree = unitMath.unit(1, normalized).toNumber('K') - unitMath.unit(0, normalized).toNumber('K');
    return si / degree;
  }
  return unitMath.unit(si, info.siUnit).toNumber(normalized);
}
