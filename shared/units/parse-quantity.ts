import { quantityKinds, type QuantityKind, type SiValue } from './quantity-kinds';
import { toSi } from './to-si';
import { UnitError } from './unit-error';

const NUMBER_THEN_UNIT = /^\s*([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*(.*?)\s*$/;

/** Options for {@link parseQuantity}. */
export interface ParseQuantityOptions {
  /** Unit assumed when the text is a bare number (e.g. the unit shown beside a form field). */
  readonly defaultUnit?: string;
}

/**
 * Read a quantity typed as "number unit" and return it in SI.
 *
 * ## Method
 * The text is split into a decimal number (optional sign and exponent; a typographic minus − is
 * accepted) and a unit; the unit is read by the units library after normalisation (µ or u, · or a
 * space, °C, °F, ² ³, 1/K) and checked against the quantity kind; see {@link toSi} for the
 * conversion, including absolute temperature versus temperature difference.
 *
 * ## References
 * - Thompson A., Taylor B. N. (2008) NIST Special Publication 811, §7 (writing values of
 *   quantities) and Appendix B (conversion factors).
 *
 * @param text - e.g. `"35 dyn/cm"`, `"1.2 mPa·s"`, `"68 °F"`
 * @param kind - the quantity kind expected
 * @param options - `defaultUnit` for bare numbers
 * @returns the value in the kind's SI unit (branded for the two temperature kinds)
 * @throws UnitError naming the quantity and the expected units when the text cannot be read
 * @example parseQuantity('35 dyn/cm', 'surfaceTension') // 0.035
 */
export function parseQuantity<K extends QuantityKind>(
  text: string,
  kind: K,
  options: ParseQuantityOptions = {},
): SiValue<K> {
  const info = quantityKinds[kind];
  if (typeof text !== 'string') throw new UnitError(info.label, String(text), info.units, 'text must be a string');
  const match = NUMBER_THEN_UNIT.exec(text.replace(/\u2212/g, '-'));
  if (!match) throw new UnitError(info.label, text, info.units, `no number at the start of "${text}"`);
  const value = Number(match[1]);
  const unit = match[2] === '' ? options.defaultUnit : match[2];
  if (unit === undefined) throw new UnitError(info.label, text, info.units, `"${text}" has no unit`);
  return toSi(value, unit, kind);
}
