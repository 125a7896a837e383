/** Conduction base state: the temperature drop across the liquid from each way heating is described. */
export { baseStateDeltaT } from './base-state-delta-t';
export { deltaTFromEvaporation } from './delta-t-from-evaporation';
export { deltaTFromHeatFlux } from './delta-t-from-heat-flux';
export { deltaTFromSurfaceTemperatures } from './delta-t-from-surface-temperatures';
export { evaporativeHeatFlux } from './evaporative-heat-flux';
export type { Heating } from './heating';
