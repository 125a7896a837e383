import { FE_S_ADSORPTION_PARAMETERS, type SoluteAdsorptionParameters } from './fe-s-adsorption-parameters';
import { surfaceTensionSignChangeTemperature } from './surface-tension-sign-change-temperature';
import { surfaceTensionTemperatureDerivative } from './surface-tension-temperature-derivative';

/** Surface flow of a melt pool and the pool shape it tends to give. */
export interface SurfaceFlowDirection {
  /** outward: hot centre → cool rim; inward: rim → centre; mixed: both, meeting inside the pool. */
  readonly direction: 'outward' | 'inward' | 'mixed';
  readonly poolShape: 'shallow-wide' | 'deep-narrow' | 'intermediate';
  /** dγ/dT at the pool edge and at the peak [N/(m·K)]. */
  readonly slopeAtEdge: number;
  readonly slopeAtPeak: number;
  /** Where dγ/dT = 0 inside the pool's range [K], or null. */
  readonly signChangeTemperature: number | null;
  readonly description: string;
}

/**
 * Direction of the thermocapillary surface flow across a melt pool, from the sign of dγ/dT over
 * the pool's surface temperatures.
 *
 * ## Method
 * Liquid is pulled toward higher surface tension. dγ/dT < 0 everywhere: tension is highest at the
 * cool rim, the surface flows outward and carries heat sideways — a shallow, wide pool.
 * dγ/dT > 0 everywhere: the surface flows inward and turns down at the centre — a deeper,
 * narrower pool. If dγ/dT changes sign at T* inside the range, the flow runs from both sides
 * toward the T* isotherm (for Fe–S: outward in the hot centre, inward in the cooler rim) and the
 * shape lies between the two.
 *
 * ## References
 * - Heiple C. R., Roper J. R. (1982) "Mechanism for minor element effect on GTA fusion zone
 *   geometry", Welding Journal 61(4):97s–102s.
 * - Mills K. C., Keene B. J., Brooks R. F., Shirali A. (1998) "Marangoni effects in welding",
 *   Phil. Trans. R. Soc. Lond. A 356:911–925. doi:10.1098/rsta.1998.0196
 * - Sahoo P., DebRoy T., McNallan M. J. (1988) Metall. Trans. B 19:483–491. doi:10.1007/BF02657748
 *
 * @param input.activity - solute activity on the 1 wt % scale (sulfur wt %) [wt %]
 * @param input.edgeTemperature - pool-edge (melting) temperature [K], > 0
 * @param input.peakTemperature - peak surface temperature [K], > edgeTemperature
 * @param input.parameters - model constants (default Fe–S)
 * @returns direction, pool-shape tendency, slopes and the sign-change temperature
 * @example surfaceFlowDirection({ activity: 0.002, edgeTemperature: 1809, peakTemperature: 2400 }).direction // 'outward'
 */
export function surfaceFlowDirection(input: {
  readonly activity: number;
  readonly edgeTemperature: number;
  readonly peakTemperature: number;
  readonly parameters?: SoluteAdsorptionParameters;
}): SurfaceFlowDirection {
  const parameters = input.parameters ?? FE_S_ADSORPTION_PARAMETERS;
  const { activity, edgeTemperature, peakTemperature } = input;
  if (!(edgeTemperature > 0 && Number.isFinite(edgeTemperature))) {
    throw new RangeError(`edgeTemperature must be a finite number > 0 K, got ${edgeTemperature}`);
  }
  if (!(peakTemperature > edgeTemperature && Number.isFinite(peakTemperature))) {
    throw new RangeError(`peakTemperature must be above edgeTemperature (${edgeTemperature} K), got ${peakTemperature}`);
  }
  const slopeAtEdge = surfaceTensionTemperatureDerivative(edgeTemperature, activity, parameters);
  const slopeAtPeak = surfaceTensionTemperatureDerivative(peakTemperature, activity, parameters);
  const change = surfaceTensionSignChangeTemperature(
    activity,
    { lower: edgeTemperature, upper: peakTemperature },
    parameters,
  );
  const range = `${edgeTemperature.toFixed(0)}–${peakTemperature.toFixed(0)} K`;
  if (change.found && change.temperature > edgeTemperature && change.temperature < peakTemperature) {
    const t = change.temperature;
    const hotSide = slopeAtPeak < 0 ? 'outward' : 'inward';
    const coolSide = slopeAtEdge < 0 ? 'outward' : 'inward';
    return Object.freeze({
      direction: 'mixed' as const,
      poolShape: 'intermediate' as const,
      slopeAtEdge,
      slopeAtPeak,
      signChangeTemperature: t,
      description:
        `dγ/dT changes sign at ${t.toFixed(0)} K inside the pool (${range}): the surface flows ${hotSide} where it is ` +
        `hotter than that and ${coolSide} where it is cooler, so the pool shape lies between shallow-wide and deep-narrow.`,
    });
  }
  const slope = Math.abs(slopeAtEdge) >= Math.abs(slopeAtPeak) ? slopeAtEdge : slopeAtPeak;
  if (slope < 0) {
    return Object.freeze({
      direction: 'outward' as const,
      poolShape: 'shallow-wide' as const,
      slopeAtEdge,
      slopeAtPeak,
      signChangeTemperature: null,
      description: `dγ/dT < 0 across ${range}: the surface flows outward from the hot centre, giving a shallow, wide pool.`,
    });
  }
  return Object.freeze({
    direction: 'inward' as const,
    poolShape: 'deep-narrow' as const,
    slopeAtEdge,
    slopeAtPeak,
    signChangeTemperature: null,
    description: `dγ/dT > 0 across ${range}: the surface flows inward and down at the centre, giving a deeper, narrower pool.`,
  });
}
