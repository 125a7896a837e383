import { assessMeltPoolFlow } from '../../../shared/physics/melt-pool/assess-melt-pool-flow';
import { surfaceTensionSignChangeTemperature } from '../../../shared/physics/melt-pool/surface-tension-sign-change-temperature';
import { surfaceTensionTemperatureDerivative } from '../../../shared/physics/melt-pool/surface-tension-temperature-derivative';
import { surfaceTensionWithSoluteAdsorption } from '../../../shared/physics/melt-pool/surface-tension-with-solute-adsorption';
import { WELDING_CAUTIONS } from '../../../shared/physics/melt-pool/welding-cautions';
import type { MeltPoolAnswer, MeltPoolInputParsed } from '../../../shared/schemas/melt-pool';
import { withPhysicsFieldErrors } from '../drying-paths/physics-range-error';

/** Points on the σ(T) curve sent to the page. */
const CURVE_POINTS = 81;
/** The wide search for the sign change [K]: from below the melting point of steels to near boiling. */
const WIDE_RANGE = { lower: 1000, upper: 3000 } as const;

const SHAPE_WORDS = {
  'shallow-wide': 'outward: the surface flows from the hot centre to the cooler rim and carries heat sideways, giving a shallow, wide pool',
  'deep-narrow': 'inward: the surface flows from the rim to the centre and turns down there, giving a deeper, narrower pool',
  intermediate: 'mixed: the surface flows both ways, meeting where dσ/dT changes sign, so the pool lies between shallow-wide and deep-narrow',
} as const;

/**
 * Melt pool flow for the API: the physics core's assessment (Fe–S adsorption model of Sahoo,
 * DebRoy & McNallan 1988), the σ(T) curve across the pool with dσ/dT, the sign-change temperature
 * inside the pool and over 1000–3000 K, the direction in words, and the welding cautions.
 * Activity is sulfur in wt % (the model's 1 wt % standard state); ppm = wt % × 10⁴.
 */
export function evaluateMeltPool(input: MeltPoolInputParsed): MeltPoolAnswer {
  const activity = input.activity ?? (input.sulfur as number);
  const sulfurPpm = activity * 1e4;
  const assessment = withPhysicsFieldErrors(() =>
    assessMeltPoolFlow({
      sulfurPpm,
      edgeTemperature: input.edgeTemperature,
      peakTemperature: input.peakTemperature,
      halfWidth: input.halfWidth,
      density: input.density,
      viscosity: input.viscosity,
      thermalDiffusivity: input.thermalDiffusivity,
    }),
  );
  const wide = surfaceTensionSignChangeTemperature(activity, WIDE_RANGE);
  const span = input.peakTemperature - input.edgeTemperature;
  const lower = Math.max(1, input.edgeTemperature - 0.1 * span);
  const upper = input.peakTemperature + 0.1 * span;
  const curve = Array.from({ length: CURVE_POINTS }, (_, i) => {
    const temperature = lower + ((upper - lower) * i) / (CURVE_POINTS - 1);
    return {
      temperature,
      surfaceTension: surfaceTensionWithSoluteAdsorption(temperature, activity),
      slope: surfaceTensionTemperatureDerivative(temperature, activity),
    };
  });
  const flow = assessment.flow;
  return {
    activity,
    sulfurPpm,
    surfaceTensionAtEdge: assessment.surfaceTensionAtEdge,
    surfaceTensionAtPeak: assessment.surfaceTensionAtPeak,
    slopeAtEdge: flow.slopeAtEdge,
    slopeAtPeak: flow.slopeAtPeak,
    signChangeTemperature: flow.signChangeTemperature,
    signChangeTemperatureWide: wide.found ? wide.temperature : null,
    direction: flow.direction,
    poolShape: flow.poolShape,
    directionText: `Surface flow ${SHAPE_WORDS[flow.poolShape]}. ${flow.description}`,
    marangoniNumber: assessment.marangoniNumber,
    pecletNumber: assessment.pecletNumber,
    surfaceVelocity: assessment.surfaceVelocity,
    surfaceStress: assessment.surfaceStress,
    flowShapesPool: assessment.flowShapesPool,
    velocityScaling:
      'u ≈ (τ²·L/(ρ·μ))^(1/3) with τ = |dσ/dT|·ΔT/L, from the balance of Marangoni stress and viscous shear in a boundary layer (DebRoy & David 1995, Rev. Mod. Phys. 67:85): a scale, not a solution.',
    curve,
    warnings: [
      ...assessment.rangeWarnings,
      ...(assessment.flowShapesPool ? [] : ['Pe ≤ 1: conduction, not the surface flow, sets the pool shape; the direction matters little here.']),
      'The model holds sulfur alone: oxygen, selenium and deoxidisers (Al, Ca, Ce) also move the flow and are not modelled.',
    ],
    cautions: WELDING_CAUTIONS.map((c) => ({ id: c.id, title: c.title, text: c.text, basis: c.basis })),
  };
}
