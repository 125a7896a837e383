import { FE_S_ADSORPTION_PARAMETERS, type SoluteAdsorptionParameters } from './fe-s-adsorption-parameters';
import { sulfurActivityFromPpm } from './sulfur-activity-from-ppm';
import { surfaceTensionTemperatureDerivative } from './surface-tension-temperature-derivative';

/** Lower and upper edges of the published sulfur band for the dγ/dT sign change in steel [ppm]. */
const SULFUR_BAND_LOWER_PPM = 30;
const SULFUR_BAND_UPPER_PPM = 70;

/** One part (heat or lot) to be joined. */
export interface JoinedPart {
  /** Heat number or lot, shown in messages. */
  readonly label: string;
  /** Mill-test sulfur [ppm by mass]. */
  readonly sulfurPpm: number;
  /** Mill-test oxygen [ppm by mass], if reported; not used by the model (see notes). */
  readonly oxygenPpm?: number;
}

/** Where a sulfur content sits against the 30–70 ppm band. */
export type SulfurBandPosition = 'below-band' | 'within-band' | 'above-band';

export interface JoinedPartAssessment {
  readonly label: string;
  readonly sulfurPpm: number;
  readonly bandPosition: SulfurBandPosition;
  /** dγ/dT at the pool temperature [N/(m·K)]. */
  readonly surfaceTensionSlope: number;
  readonly flowDirection: 'outward' | 'inward';
}

export interface SulfurComparisonWarning {
  readonly code: 'flow-direction-differs' | 'straddles-sulfur-band' | 'inside-sulfur-band';
  readonly message: string;
}

/**
 * Compares the sulfur of two parts to be joined (e.g. a tube and a fitting from different heats)
 * and warns when the weld pool would see the surface flow go different ways on each side — the
 * classic cause of an off-centre, lopsided fusion zone.
 *
 * ## Method
 * For each part: activity = ppm/10⁴ wt %; dγ/dT at the pool temperature from the Fe–S adsorption
 * model; flow outward if dγ/dT < 0, inward if > 0. Warnings:
 * - `flow-direction-differs`: the model puts the two flows in opposite directions;
 * - `straddles-sulfur-band`: one part is below 30 ppm and the other above 70 ppm, the band inside
 *   which published thresholds for the sign change lie (< 30 / > 60 ppm, Mills et al. 1998;
 *   < 50 / > 70 ppm, Mills & Keene 1990), whatever the model says;
 * - `inside-sulfur-band`: a part sits inside the band, where the direction is uncertain.
 * Oxygen, selenium and deoxidisers (Al, Ca, Ce) also move the flow and are not modelled.
 *
 * ## References
 * - Heiple C. R., Roper J. R. (1982) Welding Journal 61(4):97s–102s.
 * - Mills K. C., Keene B. J. (1990) "Factors affecting variable weld penetration", Int. Mater.
 *   Rev. 35(4):185–216. doi:10.1179/095066090790323966
 * - Mills K. C., Keene B. J., Brooks R. F., Shirali A. (1998) Phil. Trans. R. Soc. Lond. A
 *   356:911–925. doi:10.1098/rsta.1998.0196
 * - Sahoo P., DebRoy T., McNallan M. J. (1988) Metall. Trans. B 19:483–491. doi:10.1007/BF02657748
 *
 * @param input.first - first part (label, sulfur ppm, optional oxygen ppm)
 * @param input.second - second part
 * @param input.poolTemperature - representative pool surface temperature [K], > 0
 * @param input.parameters - model constants (default Fe–S)
 * @returns per-part assessment, warnings (empty when none) and standing notes
 * @example compareJoinedPartSulfur({ first: { label: 'A', sulfurPpm: 20 }, second: { label: 'B',
 *   sulfurPpm: 120 }, poolTemperature: 1850 }).warnings.map((w) => w.code)
 *   // ['flow-direction-differs', 'straddles-sulfur-band']
 */
export function compareJoinedPartSulfur(input: {
  readonly first: JoinedPart;
  readonly second: JoinedPart;
  readonly poolTemperature: number;
  readonly parameters?: SoluteAdsorptionParameters;
}): {
  readonly parts: readonly [JoinedPartAssessment, JoinedPartAssessment];
  readonly sulfurDifferencePpm: number;
  readonly warnings: readonly SulfurComparisonWarning[];
  readonly notes: readonly string[];
} {
  const parameters = input.parameters ?? FE_S_ADSORPTION_PARAMETERS;
  const assess = (part: JoinedPart, field: 'first' | 'second'): JoinedPartAssessment => {
    if (typeof part.label !== 'string' || part.label.trim() === '') {
      throw new RangeError(`${field}.label must name the heat or lot`);
    }
    if (!(part.sulfurPpm >= 0 && part.sulfurPpm <= 10_000)) {
      throw new RangeError(`${field}.sulfurPpm must be from 0 to 10000 ppm, got ${part.sulfurPpm}`);
    }
    if (part.oxygenPpm !== undefined && !(part.oxygenPpm >= 0 && part.oxygenPpm <= 10_000)) {
      throw new RangeError(`${field}.oxygenPpm must be from 0 to 10000 ppm, got ${part.oxygenPpm}`);
    }
    const slope = surfaceTensionTemperatureDerivative(
      input.poolTemperature,
      sulfurActivityFromPpm(part.sulfurPpm),
      parameters,
    );
    const bandPosition: SulfurBandPosition =
      part.sulfurPpm < SULFUR_BAND_LOWER_PPM
        ? 'below-band'
        : part.sulfurPpm > SULFUR_BAND_UPPER_PPM
          ? 'above-band'
          : 'within-band';
    return Object.freeze({
      label: part.label,
      sulfurPpm: part.sulfurPpm,
      bandPosition,
      surfaceTensionSlope: slope,
      flowDirection: slope < 0 ? ('outward' as const) : ('inward' as const),
    });
  };
  if (!(input.poolTemperature > 0 && Number.isFinite(input.poolTemperature))) {
    throw new RangeError(`poolTemperature must be a finite number > 0 K, got ${input.poolTemperature}`);
  }
  const a = assess(input.first, 'first');
  const b = assess(input.second, 'second');
  const t = input.poolTemperature.toFixed(0);
  const warnings: SulfurComparisonWarning[] = [];
  if (a.flowDirection !== b.flowDirection) {
    warnings.push({
      code: 'flow-direction-differs',
      message:
        `At ${t} K the surface flow runs ${a.flowDirection} on ${a.label} (${a.sulfurPpm} ppm S) and ` +
        `${b.flowDirection} on ${b.label} (${b.sulfurPpm} ppm S): expect a lopsided, off-centre fusion zone.`,
    });
  }
  const positions = new Set([a.bandPosition, b.bandPosition]);
  if (positions.has('below-band') && positions.has('above-band')) {
    warnings.push({
      code: 'straddles-sulfur-band',
      message:
        `${a.label} (${a.sulfurPpm} ppm) and ${b.label} (${b.sulfurPpm} ppm) lie on opposite sides of the ` +
        `${SULFUR_BAND_LOWER_PPM}–${SULFUR_BAND_UPPER_PPM} ppm sulfur band where the flow direction reverses.`,
    });
  }
  for (const part of [a, b]) {
    if (part.bandPosition === 'within-band') {
      warnings.push({
        code: 'inside-sulfur-band',
        message:
          `${part.label} (${part.sulfurPpm} ppm S) is inside the ${SULFUR_BAND_LOWER_PPM}–${SULFUR_BAND_UPPER_PPM} ppm ` +
          'band, where published thresholds disagree and the flow direction is uncertain.',
      });
    }
  }
  return Object.freeze({
    parts: Object.freeze([a, b] as const),
    sulfurDifferencePpm: Math.abs(a.sulfurPpm - b.sulfurPpm),
    warnings: Object.freeze(warnings),
    notes: Object.freeze([
      'Oxygen and selenium are surface-active too, and aluminium, calcium and cerium tie up sulfur and oxygen; ' +
        'the model uses sulfur only (Heiple & Roper 1982).',
      'Mill-test reports can be wrong and can omit trace elements: confirm with a qualified procedure and trial welds.',
    ]),
  });
}
