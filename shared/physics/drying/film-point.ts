/** Internal shape of one evaluated point of a Drying path (see evaluateFilmPoint). */
import type { Regime } from '../stability/types';

export interface FilmPoint {
  thickness: number;
  solidsFraction: number;
  filmTemperature: number;
  viscosity: number;
  evaporationFlux: number;
  vapourPressure: number;
  deltaT: number;
  deltaC: number;
  rayleigh: number;
  thermalMarangoni: number;
  solutalMarangoni: number;
  thermalBiot: number;
  massBiot: number;
  thermalMargin: number;
  solutalMargin: number;
  regime: Regime;
  /**
   * Growth-rate scale of the least stable drive, max over drives of (χ/h²)(1/λ − 1) [1/s], χ = κ or D:
   * positive past onset (cells grow), negative below it (disturbances decay).
   */
  growthRate: number;
}

/** Memoised critical-value tables shared by every point of one path. */
export interface MarginTables {
  thermal: (biot: number) => number;
  solutal: (biot: number) => number;
}
