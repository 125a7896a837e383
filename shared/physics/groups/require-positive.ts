import { requireFinite } from './require-finite';

/**
 * Check that an input is a finite number greater than zero (or at least zero) and return it.
 *
 * ## Method
 * {@link requireFinite}, then `value > 0` (or `value ≥ 0` with `allowZero`).
 *
 * ## References
 * - STYLE.md §4 of this project: inside the core, throw RangeError naming the parameter and unit.
 *
 * @param name - parameter name used in the message, e.g. `"viscosity"`
 * @param value - the value to check
 * @param unit - its unit for the message, e.g. `"Pa·s"`
 * @param options - `allowZero: true` accepts 0
 * @returns the value, unchanged
 * @throws RangeError naming the parameter, the limit and the unit
 * @example requirePositive('viscosity', 1e-3, 'Pa·s') // 0.001
 */
export function requirePositive(
  name: string,
  value: number,
  unit: string,
  options: { allowZero?: boolean } = {},
): number {
  requireFinite(name, value, unit);
  if (options.allowZero ? value < 0 : value <= 0) {
    throw new RangeError(`${name} must be ${options.allowZero ? '≥ 0' : '> 0'} [${unit}], got ${value}`);
  }
  return value;
}
