import type { ProcessKind } from '../schemas/layer-checks';

/**
 * The closing line under every set of cautions.
 *
 * ## References
 * - NFPA 86 Standard for Ovens and Furnaces; EN 1539:2015 Dryers and ovens, in which flammable
 *   substances are released — Safety requirements.
 */
export const CLOSING_LINE =
  'QuietLayer predicts flow behaviour; it is not a safety design tool. Follow NFPA 86 / EN 1539 (or your local code), ' +
  "your insurer's requirements and your authority having jurisdiction; local codes and qualified practice govern.";

const solventBorne = [
  'Keep the oven exhaust at or below 25 % of the lower flammable limit (LFL) at the maximum solvent load; up to 50 % only with continuous solvent-vapour monitoring and control (NFPA 86).',
  'A thicker wet film, a faster line, lower solids or a lower-LFL solvent all raise the solvent load: re-check ventilation before you change any of them.',
  'Never bypass the pre-ignition purge (at least 4 oven volumes of fresh air) or the exhaust and heater interlocks; keep explosion relief clear (NFPA 86).',
  'The LFL falls as temperature rises: use the value corrected to oven temperature (from memory — verify against the standard).',
  'Fast solvents cool the surface: below the dew point water condenses (blushing), and the surface is colder than it looks.',
  'NMP and similar solvents are reproductive toxicants and irritants under EU limits: use closed handling and solvent recovery.',
  'Oven panels and ducts are hot: local codes limit outer-surface temperature or require guards.',
];

const meltPool = [
  'Arc and laser radiation: eye and skin protection and a laser safety programme (ANSI Z136 / IEC 60825 — from memory, verify).',
  'Stainless and high-alloy steels give hexavalent-chromium and other hazardous fume: use extraction and monitoring.',
  'Additive-manufacturing metal powders can be combustible or reactive: follow the applicable code for their handling.',
  'A predicted pool shape is a tendency: only a qualified welding procedure or an AM qualification build releases production work (ASME Section IX or your governing code).',
  'Mill-test sulfur is not the whole story: Al, Se, Ca, Ce and O also shift penetration, and mill test reports can be wrong.',
];

const everyKind = [
  'The margin is only as good as the dσ/dT, dσ/dc and viscosity data behind it: check the sources and the property spread.',
  'Inputs outside the range the properties were stated for are extrapolations: treat the result as indicative.',
];

/**
 * Safety cautions to show on a layer check of a process kind.
 *
 * ## Method
 * Fixed wording per kind: solvent-borne coats and cast films get the oven-ventilation cautions,
 * melt pools the welding cautions, every kind the data-quality cautions.
 *
 * ## References
 * - NFPA 86 Standard for Ovens and Furnaces (≤ 25 % LFL; ≤ 50 % with monitoring; purge of 4 volumes).
 * - ASME Boiler and Pressure Vessel Code, Section IX (procedure qualification).
 * - Heiple C.R., Roper J.R. (1982) Welding Journal, April (minor elements and penetration).
 *
 * @param kind - process kind
 * @returns cautions, most important first
 * @example processCautions('melt-pool')[0] // 'Arc and laser radiation: …'
 */
export function processCautions(kind: ProcessKind): string[] {
  if (kind === 'drying-coat' || kind === 'cast-film') return [...solventBorne, ...everyKind];
  if (kind === 'melt-pool') return [...meltPool, ...everyKind];
  return ['Hot liquids and surfaces burn; flammable liquids need ventilation well below their lower flammable limit.', ...everyKind];
}
