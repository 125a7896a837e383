/**
 * Write a number with a given count of significant digits, in plain decimal form for everyday
 * magnitudes (10⁻⁵ up to 10⁹) and in exponent form outside.
 *
 * ## Method
 * Round with `toPrecision`, then print the rounded value with just enough decimals to show the
 * requested significant digits (trailing zeros kept, so 4 digits of 25.4 print as 25.40).
 *
 * ## References
 * - Thompson A., Taylor B. N. (2008) NIST Special Publication 811, §10.5 (rounding numbers).
 *
 * @param value - the number to write
 * @param significantDigits - digits to keep, 1–21
 * @returns the number as text ("NaN", "Infinity" and "-Infinity" pass through)
 * @example formatSignificant(0.0727415, 4) // '0.07274'
 */
export function formatSignificant(value: number, significantDigits: number): string {
  if (!Number.isInteger(significantDigits) || significantDigits < 1 || significantDigits > 21) {
    throw new RangeError(`significantDigits must be an integer 1–21, got ${significantDigits}`);
  }
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return (0).toFixed(Math.max(0, significantDigits - 1));
  const rounded = Number(value.toPrecision(significantDigits));
  const exponent = Math.floor(Math.log10(Math.abs(rounded)));
  if (exponent < -5 || exponent >= 9) return rounded.toExponential(significantDigits - 1);
  return rounded.toFixed(Math.max(0, significantDigits - 1 - exponent));
}
