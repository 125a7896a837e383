/**
 * Linear stability solver of QuietLayer: stationary onset of buoyancy and thermocapillary
 * convection in a horizontal liquid layer, flat or deformable surface.
 *
 * Public API (signatures are stable):
 * - marginalFactor(problem, wavenumber): λ(k)
 * - neutralCurve(problem, options)
 * - onsetMargin(problem): OnsetResult
 * - criticalRayleigh(boundaries), criticalMarangoni(boundaries)
 * - classifyRegime({ margin, buoyancyShare, longWave })
 * - regimeLabels
 */
export type {
  BottomMechanics,
  ThermalCondition,
  TopKind,
  LayerBoundaries,
  StabilityProblem,
  Regime,
  OnsetResult,
  NeutralCurveOptions,
  NeutralCurve,
  CriticalValue,
} from './types';
export { regimeLabels } from './regime-labels';
