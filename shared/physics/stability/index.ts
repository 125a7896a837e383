/**
 * Linear stability solver of QuietLayer: stationary onset of buoyancy and thermocapillary
 * convection in a horizontal liquid layer, flat or deformable surface. Pure functions; the only
 * module-level data is the lazily built, read-only table of collocation grids
 * (chebyshev-collocation-table.ts) and one set of scratch arrays per grid that every call
 * overwrites before use (create-marginal-factor-evaluator.ts); no caller can observe either.
 *
 * - marginalFactor(problem, wavenumber): λ(k)
 * - neutralCurve(problem, options)
 * - onsetMargin(problem, options?): OnsetResult (the Onset margin and its regime)
 * - onsetMarginSweep(problems): OnsetResult[] (neighbouring problems, each search started at the previous k_c)
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
  OnsetMarginOptions,
  NeutralCurveOptions,
  NeutralCurve,
  CriticalValue,
} from './types';
export type { RegimeInputs } from './classify-regime';
export { regimeLabels } from './regime-labels';
export { marginalFactor } from './marginal-factor';
export { neutralCurve } from './neutral-curve';
export { onsetMargin } from './onset-margin';
export { onsetMarginSweep } from './onset-margin-sweep';
export { criticalRayleigh } from './critical-rayleigh';
export { criticalMarangoni } from './critical-marangoni';
export { classifyRegime, BUOYANCY_DOMINANT_SHARE, SURFACE_TENSION_DOMINANT_SHARE } from './classify-regime';
