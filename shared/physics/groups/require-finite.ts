/**
 * Check that an input is a finite number and return it.
 *
 * ## Method
 * `Number.isFinite(value)`; NaN, ±Infinity and non-numbers are refused, so no NaN can leak from the
 * core into a result without a named cause.
 *
 * ## References
 * - STYLE.md §4 of this project: inside the core, throw RangeError naming the parameter and unit.
 *
 * @param name - parameter name used in the message, e.g. `"depth"`
 * @param value - the value to check
 * @param unit - its unit for the message, e.g. `"m"`
 * @returns the value, unchanged
 * @throws RangeError `"<name> must be a finite number [<unit>], got <value>"`
 * @example requireFinite('deltaT', 10, 'K') // 10
 */
export function requireFinite(name: string, value: number, unit: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number [${unit}], got ${String(value)}`);
  }
  return value;
}
