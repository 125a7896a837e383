import type { DryingPathSummary } from '../../../shared/schemas/drying-paths';
import { formatSignificant } from '../../../shared/units/format-significant';

/** A section of a process sheet: a heading, label/value rows, paragraphs and cautions. */
export interface SheetSection {
  title: string;
  rows: { label: string; value: string }[];
  paragraphs: string[];
  cautions: string[];
}

const VERDICT_WORDS: Record<DryingPathSummary['verdict'], string> = {
  quiet: 'Quiet throughout — no pattern expected in the dry film',
  'cells-die-out': 'Cells possible, but they die out before the film freezes — no pattern expected',
  'pattern-possible': 'Cells grow and only partly level out — a faint pattern is possible in the dry film',
  'pattern-expected': 'Cells outlive the drying — a pattern is expected in the dry film',
};

const sig = (x: number, digits = 3) => formatSignificant(x, digits);
const margin = (x: number | null) => (x === null ? 'no onset possible' : `${sig(x)} ×`);
const seconds = (x: number | null) => (x === null ? '—' : `${sig(x)} s`);

/**
 * The Drying path section of a process sheet, from a saved set-up's stored summary (no physics is
 * re-run, so a signed sheet shows exactly the numbers that were stored). Pure.
 *
 * @param setup - title, check revision and the stored summary of a drying set-up
 * @returns the section: verdict, onset and freeze times, margins, mass balance, per-zone loads and
 *   the ventilation cautions deferring to NFPA 86 / EN 1539 and the authority having jurisdiction
 */
export function dryingSheetSection(setup: { title: string; revision: number; summary: DryingPathSummary }): SheetSection {
  const s = setup.summary;
  const rows = [
    { label: 'Drying set-up', value: `${setup.title} (check revision ${setup.revision})` },
    { label: 'Verdict', value: VERDICT_WORDS[s.verdict] },
    { label: 'Cells possible from', value: s.cellsPossibleAt === null ? 'never (margins stay ≥ 1)' : `${seconds(s.cellsPossibleAt)} (${s.drive} drive)` },
    { label: 'Film frozen at', value: s.frozenAt === null ? 'not inside the oven' : `${seconds(s.frozenAt)} (${s.frozenBy})` },
    { label: 'Smallest thermal margin', value: margin(s.minThermalMargin) },
    { label: 'Smallest solutal margin', value: margin(s.minSolutalMargin) },
    { label: 'Dry thickness (wet × volume solids)', value: `${sig(s.expectedDryThickness * 1e6)} µm expected, ${sig(s.modelledDryThickness * 1e6)} µm modelled` },
    { label: 'Solvent left at exit', value: `${sig(s.exitSolventFraction * 100)} vol %` },
    ...s.zones.map((zone) => ({
      label: `${zone.name}: solvent and fresh air`,
      value:
        zone.solventLitresPerMinute === null
          ? `${sig(zone.residenceTime)} s; no web width given, so no solvent load`
          : `${sig(zone.residenceTime)} s; ${sig(zone.solventLitresPerMinute)} L/min solvent; ≥ ${sig((zone.freshAirRequired ?? 0) * 60)} m³/min fresh air for ≤ ${Math.round((zone.lflFraction ?? 0.25) * 100)} % LFL`,
    })),
  ];
  const cautions = [
    ...s.zones.flatMap((zone) => (zone.ventilationText ? [`${zone.name}: ${zone.ventilationText}`] : [])),
    'QuietLayer predicts flow behaviour; it is not a safety design tool. Follow NFPA 86 / EN 1539 (or your local code), your insurer\'s requirements and your authority having jurisdiction.',
  ];
  return { title: 'Drying path', rows, paragraphs: [s.verdictText, ...s.warnings], cautions };
}
