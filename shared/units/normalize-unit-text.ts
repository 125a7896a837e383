import type { QuantityKind } from './quantity-kinds';

/**
 * Rewrite a unit as people type it into the units library's syntax.
 *
 * ## Method
 * Micro signs (U+00B5, U+03BC) become `u`; `°C`, `℃`, `°F`, `℉` become `degC`/`degF`; the middle dot,
 * `⋅`, `×`, `*` and a dot between letters become a space (a product of units); superscripts ² ³ ⁻¹
 * become powers, as does a bare trailing 2 or 3 (`cm3` → `cm^3`); `Btu` becomes the library's `BTU` (the International Table Btu, 1055.05585262 J)
 * and `hr` becomes `h`; a leading `1/X` becomes `X^-1` (the library cannot divide into a bare 1).
 * For temperatures only, a bare `C` or `F` means degrees (elsewhere `C` is the coulomb).
 *
 * ## References
 * - Thompson A., Taylor B. N. (2008) NIST Special Publication 811, §6 and Appendix B (unit symbols,
 *   the International Table Btu).
 *
 * @param unitText - the unit part of a quantity as typed, e.g. `"mPa·s"`
 * @param kind - the quantity kind (decides how a bare `C`/`F` is read)
 * @returns the unit in the library's syntax, e.g. `"mPa s"`
 * @example normalizeUnitText('Btu/(h·ft²·°F)', 'heatTransferCoefficient') // 'BTU/(h ft^2 degF)'
 */
export function normalizeUnitText(unitText: string, kind: QuantityKind): string {
  let unit = unitText
    .trim()
    .replace(/[\u00b5\u03bc]/g, 'u')
    .replace(/(°\s*C|℃)/g, 'degC')
    .replace(/(°\s*F|℉)/g, 'degF')
    .replace(/°\s*K/g, 'K')
    .replace(/deg\s+([CF])\b/g, 'deg$1')
    .replace(/[·⋅×*]/g, ' ')
    .replace(/([A-Za-z])\.(?=[A-Za-z])/g, '$1 ')
    .replace(/⁻¹/g, '^-1')
    .replace(/⁻²/g, '^-2')
    .replace(/⁻³/g, '^-3')
    .replace(/²/g, '^2')
    .replace(/³/g, '^3')
    .replace(/([A-Za-z])([23])(?![\d.^])/g, '$1^$2')
    .replace(/\bBtu\b/gi, 'BTU')
    .replace(/\bhr\b/g, 'h')
    .replace(/\s+/g, ' ')
    .trim();
  if (kind === 'temperature' || kind === 'temperatureDifference') {
    if (unit === 'C') unit = 'degC';
    if (unit === 'F') unit = 'degF';
  }
  const reciprocal = /^1?\s*\/\s*\(?([^()]+?)\)?$/.exec(unit);
  if (reciprocal) {
    unit = reciprocal[1]
      .trim()
      .split(/\s+/)
      .map((factor) => (factor.includes('^') ? factor.replace(/\^(-?)(\d+)/, (_m, sign: string, p: string) => `^${sign ? '' : '-'}${p}`) : `${factor}^-1`))
      .join(' ');
  }
  return unit;
}
