import { FE_S_ADSORPTION_PARAMETERS, type SoluteAdsorptionParameters } from './fe-s-adsorption-parameters';
import { marangoniSurfaceVelocity } from './marangoni-surface-velocity';
import { meltPoolMarangoniNumber } from './melt-pool-marangoni-number';
import { meltPoolPecletNumber } from './melt-pool-peclet-number';
import { sulfurActivityFromPpm } from './sulfur-activity-from-ppm';
import { surfaceFlowDirection, type SurfaceFlowDirection } from './surface-flow-direction';
import { surfaceTensionWithSoluteAdsorption } from './surface-tension-with-solute-adsorption';

/** Everything the Melt pool flow view shows for one pool. */
export interface MeltPoolFlowAssessment {
  readonly activity: number;
  /** γ at the pool edge and at the peak [N/m]. */
  readonly surfaceTensionAtEdge: number;
  readonly surfaceTensionAtPeak: number;
  readonly flow: SurfaceFlowDirection;
  /** Largest |dγ/dT| over edge and peak, used for the scales [N/(m·K)]. */
  readonly drivingSlope: number;
  readonly marangoniNumber: number;
  readonly surfaceStress: number;
  readonly surfaceVelocity: number;
  readonly pecletNumber: number;
  /** True when Pe > 1: the flow, not conduction, sets the pool shape. */
  readonly flowShapesPool: boolean;
  /** Inputs outside the range the Fe–S constants were fitted for. */
  readonly rangeWarnings: readonly string[];
}

/**
 * Melt pool flow for one pool: surface tension, the sign of dγ/dT across the pool, the flow
 * direction and pool-shape tendency, and the Marangoni number, velocity scale and Péclet number.
 *
 * ## Method
 * Activity from sulfur ppm (a = ppm/10⁴ wt %); γ and dγ/dT from the adsorption model; direction
 * from the sign of dγ/dT between edge and peak temperature; the scales use |dγ/dT| at whichever end
 * has the larger magnitude (a conservative drive when the sign changes), ΔT = peak − edge and L =
 * pool half-width: Ma = |dγ/dT|ΔT L/(μκ), u = (τ²L/(ρμ))^(1/3) with τ = |dγ/dT|ΔT/L, Pe = uL/κ.
 *
 * ## References
 * - Sahoo P., DebRoy T., McNallan M. J. (1988) Metall. Trans. B 19:483–491. doi:10.1007/BF02657748
 * - DebRoy T., David S. A. (1995) Rev. Mod. Phys. 67(1):85–112. doi:10.1103/RevModPhys.67.85
 * - Mills K. C., Keene B. J., Brooks R. F., Shirali A. (1998) Phil. Trans. R. Soc. Lond. A
 *   356:911–925. doi:10.1098/rsta.1998.0196
 *
 * @param input.sulfurPpm - sulfur content [ppm by mass]
 * @param input.edgeTemperature - pool-edge temperature [K]
 * @param input.peakTemperature - peak surface temperature [K]
 * @param input.halfWidth - pool half-width L [m]
 * @param input.density - ρ [kg/m³]
 * @param input.viscosity - μ [Pa·s]
 * @param input.thermalDiffusivity - κ [m²/s]
 * @param input.parameters - model constants (default Fe–S)
 * @returns the assessment
 * @example assessMeltPoolFlow({ sulfurPpm: 20, edgeTemperature: 1809, peakTemperature: 2400,
 *   halfWidth: 2.5e-3, density: 6900, viscosity: 6e-3, thermalDiffusivity: 5e-6 }).flow.direction // 'outward'
 */
export function assessMeltPoolFlow(input: {
  readonly sulfurPpm: number;
  readonly edgeTemperature: number;
  readonly peakTemperature: number;
  readonly halfWidth: number;
  readonly density: number;
  readonly viscosity: number;
  readonly thermalDiffusivity: number;
  readonly parameters?: SoluteAdsorptionParameters;
}): MeltPoolFlowAssessment {
  const parameters = input.parameters ?? FE_S_ADSORPTION_PARAMETERS;
  const activity = sulfurActivityFromPpm(input.sulfurPpm);
  const flow = surfaceFlowDirection({
    activity,
    edgeTemperature: input.edgeTemperature,
    peakTemperature: input.peakTemperature,
    parameters,
  });
  const drivingSlope = Math.max(Math.abs(flow.slopeAtEdge), Math.abs(flow.slopeAtPeak));
  const temperatureDifference = input.peakTemperature - input.edgeTemperature;
  const marangoniNumber = meltPoolMarangoniNumber({
    surfaceTensionSlope: drivingSlope,
    temperatureDifference,
    length: input.halfWidth,
    viscosity: input.viscosity,
    thermalDiffusivity: input.thermalDiffusivity,
  });
  const scale = marangoniSurfaceVelocity({
    surfaceTensionSlope: drivingSlope,
    temperatureDifference,
    length: input.halfWidth,
    density: input.density,
    viscosity: input.viscosity,
  });
  const pecletNumber = meltPoolPecletNumber(scale.velocity, input.halfWidth, input.thermalDiffusivity);
  const rangeWarnings: string[] = [];
  if (input.edgeTemperature < parameters.meltingTemperature) {
    rangeWarnings.push(
      `edgeTemperature ${input.edgeTemperature} K is below the ${parameters.meltingTemperature} K reference melting point of the model: values there are extrapolated.`,
    );
  }
  if (input.peakTemperature > 3000) {
    rangeWarnings.push(
      `peakTemperature ${input.peakTemperature} K is far above the range the adsorption constants were fitted for; near boiling, vapour recoil also drives the flow.`,
    );
  }
  if (input.sulfurPpm > 1000) {
    rangeWarnings.push(`sulfurPpm ${input.sulfurPpm} ppm is beyond the dilute range where activity ≈ wt % holds.`);
  }
  return Object.freeze({
    activity,
    surfaceTensionAtEdge: surfaceTensionWithSoluteAdsorption(input.edgeTemperature, activity, parameters),
    surfaceTensionAtPeak: surfaceTensionWithSoluteAdsorption(input.peakTemperature, activity, parameters),
    flow,
    drivingSlope,
    marangoniNumber,
    surfaceStress: scale.surfaceStress,
    surfaceVelocity: scale.velocity,
    pecletNumber,
    flowShapesPool: pecletNumber > 1,
    rangeWarnings: Object.freeze(rangeWarnings),
  });
}
