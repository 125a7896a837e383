/** Melt pool flow: solute-adsorption surface tension, flow direction, scales, sulfur comparison, cautions. */
export { assessMeltPoolFlow, type MeltPoolFlowAssessment } from './assess-melt-pool-flow';
export {
  compareJoinedPartSulfur,
  type JoinedPart,
  type JoinedPartAssessment,
  type SulfurBandPosition,
  type SulfurComparisonWarning,
} from './compare-joined-part-sulfur';
export { FE_S_ADSORPTION_PARAMETERS, type SoluteAdsorptionParameters } from './fe-s-adsorption-parameters';
export { LARKSPUR_WELD_CELL_DEMO } from './larkspur-weld-cell-demo';
export { marangoniSurfaceVelocity } from './marangoni-surface-velocity';
export { meltPoolMarangoniNumber } from './melt-pool-marangoni-number';
export { meltPoolPecletNumber } from './melt-pool-peclet-number';
export { sulfurActivityFromPpm } from './sulfur-activity-from-ppm';
export { surfaceFlowDirection, type SurfaceFlowDirection } from './surface-flow-direction';
export { surfaceTensionSignChangeTemperature, type SignChangeResult } from './surface-tension-sign-change-temperature';
export { surfaceTensionTemperatureDerivative } from './surface-tension-temperature-derivative';
export { surfaceTensionWithSoluteAdsorption } from './surface-tension-with-solute-adsorption';
export { WELDING_CAUTIONS, type WeldingCaution } from './welding-cautions';
