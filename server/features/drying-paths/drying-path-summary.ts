import type { DryingPathResult } from '../../../shared/physics/drying/types';
import type { DryingPathSummary } from '../../../shared/schemas/drying-paths';

const finiteOrNull = (x: number): number | null => (Number.isFinite(x) ? x : null);

/**
 * What a saved drying set-up keeps of its Drying path result: the verdict, onset and freeze times,
 * the smallest margins, the mass balance and each zone's solvent load and fresh-air caution.
 * Pure: the same result always gives the same summary.
 *
 * @param result - the physics core's Drying path result (SI)
 * @returns the summary (SI; infinite margins as null)
 */
export function summarizeDryingPath(result: DryingPathResult): DryingPathSummary {
  const { onset, massBalance } = result;
  return {
    verdict: onset.verdict,
    verdictText: onset.verdictText,
    cellsPossibleAt: onset.cellsPossibleAt,
    drive: onset.drive,
    frozenAt: onset.frozenAt,
    frozenBy: onset.frozenBy,
    minThermalMargin: finiteOrNull(onset.minThermalMargin),
    minSolutalMargin: finiteOrNull(onset.minSolutalMargin),
    growthExponent: onset.growthExponent,
    decayExponent: onset.decayExponent,
    expectedDryThickness: massBalance.expectedDryThickness,
    modelledDryThickness: massBalance.modelledDryThickness,
    exitSolventFraction: massBalance.exitSolventFraction,
    zones: result.zones.map((zone) => ({
      name: zone.name,
      residenceTime: zone.residenceTime,
      thicknessOut: zone.thicknessOut,
      solidsOut: zone.solidsOut,
      maxFilmTemperature: zone.maxFilmTemperature,
      solventLitresPerMinute: zone.solventLitresPerMinute,
      freshAirRequired: zone.ventilation?.freshAirRequired ?? null,
      lflFraction: zone.ventilation?.lflFraction ?? null,
      ventilationText: zone.ventilation?.text ?? null,
    })),
    warnings: [...result.warnings],
  };
}
