/** Characters that make a spreadsheet read a cell as a formula (or split it) when it starts with them. */
const FORMULA_START = /^[=+\-@\t\r]/;

/**
 * Make a text cell safe to open in a spreadsheet (CSV formula injection).
 *
 * ## Method
 * A cell that begins with =, +, -, @, a tab or a carriage return is prefixed with an apostrophe,
 * so spreadsheet programs show it as text instead of evaluating it. Numbers are written by the
 * caller as numbers and never passed here (a negative number would otherwise gain an apostrophe).
 *
 * ## References
 * - OWASP Foundation, "CSV Injection" (community page, accessed 2026).
 *
 * @param value - the text of one cell
 * @returns the text, prefixed with ' when it could start a formula
 * @example escapeCsvCell('=HYPERLINK("x")') // "'=HYPERLINK(\"x\")"
 */
export function escapeCsvCell(value: string): string {
  return FORMULA_START.test(value) ? `'${value}` : value;
}
