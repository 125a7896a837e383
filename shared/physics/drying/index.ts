/**
 * Drying path of a single-solvent coating through a zoned oven (QuietLayer physics core).
 * Public API: computeDryingPath (the whole path) and its building blocks, plus the Line 2 demo data.
 */
export { computeDryingPath } from './compute-drying-path';
export { prepareDryingPath } from './prepare-drying-path';
export { dryingRates, type DryingRates } from './drying-rates';
export { evaluateFilmPoint } from './evaluate-film-point';
export { createCriticalMarangoniTable } from './create-critical-marangoni-table';
export { evaporationFlux, type EvaporationFluxResult } from './evaporation-flux';
export { antoineVapourPressure } from './antoine-vapour-pressure';
export { chiltonColburnMassTransfer } from './chilton-colburn-mass-transfer';
export { kriegerDoughertyViscosity } from './krieger-dougherty-viscosity';
export { exponentialViscosity } from './exponential-viscosity';
export { filmViscosity } from './film-viscosity';
export { zoneResidenceTime } from './zone-residence-time';
export { solventLoadRate } from './solvent-load-rate';
export { solventVentilationCaution, type SolventVentilationCaution } from './solvent-ventilation-caution';
export { demoLine2DryingInput } from './demo-line-2';
export type { FilmPoint, MarginTables } from './film-point';
export type {
  DryingAir,
  DryingEvent,
  DryingFilm,
  DryingPathInput,
  DryingPathResult,
  DryingSeries,
  DryingSolvent,
  DryingSubstrate,
  DryingVerdict,
  DryingZoneSummary,
  OvenTransport,
  OvenZone,
  SolventVolatility,
  ViscosityLaw,
} from './types';
