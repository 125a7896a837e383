/**
 * Error thrown when a quantity's text cannot be read or its unit does not fit the quantity.
 * The message names the quantity and what was expected, e.g.
 * `viscosity (dynamic viscosity): unit "mm" does not fit; expected a unit such as Pa·s, mPa·s, cP, P`.
 *
 * ## Method
 * Plain `Error` subclass carrying the quantity kind, the offending text and the expected units, so the
 * server can return it as a 422 next to the field and the client can show it beside the input.
 *
 * ## References
 * - ECMAScript 2023 Language Specification, §20.5 Error Objects.
 *
 * @example new UnitError('length', '3 kg', ['m', 'mm']).message // 'length: ... expected a unit such as m, mm'
 */
export class UnitError extends Error {
  /** The quantity kind that was asked for, e.g. `'length'`. */
  readonly quantity: string;
  /** The text that could not be read. */
  readonly text: string;
  /** Example units that the quantity accepts. */
  readonly expected: readonly string[];

  constructor(quantity: string, text: string, expected: readonly string[], problem?: string) {
    const detail = problem ?? `cannot read "${text}"`;
    super(`${quantity}: ${detail}; expected a number and a unit such as ${expected.join(', ')}`);
    this.name = 'UnitError';
    this.quantity = quantity;
    this.text = text;
    this.expected = expected;
  }
}
