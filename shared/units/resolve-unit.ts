import type { Unit } from 'mathjs';
import { normalizeUnitText } from './normalize-unit-text';
import { quantityKinds, type QuantityKind } from './quantity-kinds';
import { UnitError } from './unit-error';
import { unitMath } from './unit-math';

/**
 * Read a unit as typed and check that it measures the given kind of quantity.
 *
 * ## Method
 * The text is normalised ({@link normalizeUnitText}), parsed by the units library as one unit of
 * that unit, and its dimension compared with the kind's SI unit (`equalBase`), so that "mm" is refused
 * for a viscosity and "1/K" is accepted for an expansion coefficient.
 *
 * ## References
 * - BIPM (2019) "The International System of Units (SI)", 9th ed., §2.3 (base and derived units).
 *
 * @param unitText - the unit as typed, e.g. `"mN/m"`
 * @param kind - the quantity it must measure
 * @returns the library unit (value 1) and its normalised text
 * @throws UnitError when the unit is unknown or measures something else
 * @example resolveUnit('cP', 'dynamicViscosity').unit.toNumber('Pa s') // 0.001
 */
export function resolveUnit(unitText: string, kind: QuantityKind): { unit: Unit; normalized: string } {
  const key = `${kind}\u0000${unitText}`;
  const known = RESOLVED.get(key);
  if (known !== undefined) return known;
  const resolved = Object.freeze(resolveUnitUncached(unitText, kind));
  if (RESOLVED.size >= RESOLVED_LIMIT) RESOLVED.clear();
  RESOLVED.set(key, resolved);
  return resolved;
}

/**
 * Units already resolved, by kind and text (a form sends the same few units again and again, and
 * parsing one with the unit library costs more than the rest of reading a quantity). A pure memo:
 * the answer depends on the text and kind alone; failures are not kept (they throw every time).
 * Bounded: emptied when it reaches RESOLVED_LIMIT entries.
 */
const RESOLVED = new Map<string, Readonly<{ unit: Unit; normalized: string }>>();
const RESOLVED_LIMIT = 1000;

function resolveUnitUncached(unitText: string, kind: QuantityKind): { unit: Unit; normalized: string } {
  const info = quantityKinds[kind];
  const normalized = normalizeUnitText(unitText, kind);
  if (normalized === '') throw new UnitError(info.label, unitText, info.units, 'no unit given');
  let unit: Unit;
  try {
    unit = unitMath.unit(1, normalized);
  } catch {
    throw new UnitError(info.label, unitText, info.units, `unknown unit "${unitText}"`);
  }
  if (!unit.equalBase(unitMath.unit(1, info.siUnit))) {
    throw new UnitError(info.label, unitText, info.units, `unit "${unitText}" is not a unit of ${info.label}`);
  }
  return { unit, normalized };
}
