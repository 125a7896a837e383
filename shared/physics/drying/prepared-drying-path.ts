/**
 * Internal shapes of a Drying path after its input has been checked and each zone resolved
 * (durations, mass-transfer coefficients). Not part of the public API.
 */
import type { DryingPathInput } from './types';

/** One zone with everything the right-hand side needs. */
export interface PreparedZone {
  index: number;
  name: string;
  /** [s] */
  startTime: number;
  endTime: number;
  duration: number;
  /** [m]; NaN in schedule mode. */
  length: number;
  /** [K] */
  airTemperature: number;
  /** [W/(m²·K)] */
  heatTransferTop: number;
  heatTransferBack: number;
  /** k_m [m/s]; NaN for a fixed-rate solvent. */
  massTransferCoefficient: number;
  /** k_m·c_∞ [kg/(m²·s)]. */
  ambientBackFlux: number;
}

/** A checked Drying path input plus its resolved zones. */
export interface PreparedDryingPath {
  input: DryingPathInput;
  zones: PreparedZone[];
  /** [s] */
  totalTime: number;
  /** [m/s]; null in schedule mode. */
  lineSpeed: number | null;
  /** [m]; null when not given or in schedule mode. */
  webWidth: number | null;
  /** [Pa·s] */
  freezeViscosity: number;
  /** [-]; null when no solids limit applies. */
  freezeSolidsFraction: number | null;
  /** h₀·φ₀ [m]. */
  solidsThickness: number;
  /** [-] */
  gridPoints: number;
  rtol: number;
}
