/**
 * Public types of QuietLayer's linear stability solver (stationary onset of convection in a
 * horizontal liquid layer heated from one side). All quantities are dimensionless: lengths are
 * scaled by the layer depth d, so wavenumbers are in units of 1/d (wavelength 2πd/k).
 *
 * Conventions (as in the project's reference notes): Ra = gβΔT d³/(νκ); Ma = σ_T ΔT d/(μκ) with
 * σ_T = −dσ/dT; Bi = h d/λ; Cr = μκ/(σd); Bo = ρgd²/σ; Ga = Bo/Cr. ΔT is the temperature drop
 * from the bottom to the surface in the conduction state (positive = heated from below).
 */

/** Mechanical condition at the bottom wall: no-slip ('rigid') or stress-free ('free'). */
export type BottomMechanics = 'rigid' | 'free';

/** Thermal condition at the bottom wall: fixed temperature or fixed heat flux. */
export type ThermalCondition = 'conducting' | 'insulating';

/**
 * Kind of upper boundary: 'rigid' (no-slip lid), 'free' (flat stress-free, no thermocapillary
 * stress) or 'surface' (free surface with thermocapillary stress; flat unless a crispation number
 * is given).
 */
export type TopKind = 'rigid' | 'free' | 'surface';

/** Boundary conditions of the layer. */
export interface LayerBoundaries {
  bottom: BottomMechanics;
  bottomThermal: ThermalCondition;
  top: TopKind;
  /** Biot number of the top, Bi = h d/λ [-], ≥ 0; Infinity = conducting (fixed-temperature) top. */
  biot: number;
}

/** A stability question: boundaries plus the operating point. */
export interface StabilityProblem extends LayerBoundaries {
  /** Rayleigh number at the operating point [-]; may be 0 or negative (heated from above). */
  rayleigh: number;
  /** Marangoni number at the operating point [-]; may be 0 or negative (dσ/dT > 0 or heated from above). */
  marangoni: number;
  /** Crispation number Cr = μκ/(σd) [-], ≥ 0; top 'surface' only; 0 or undefined = flat surface. */
  crispation?: number;
  /** Bond number Bo = ρgd²/σ [-], ≥ 0; used only with a deformable surface (crispation > 0). */
  bond?: number;
}

/** Regime names, in QuietLayer's vocabulary. */
export type Regime = 'quiet' | 'surface-tension-cells' | 'buoyancy-cells' | 'mixed-cells' | 'long-wave-thinning';

/** Result of an onset-margin solve. Every field is a plain number, boolean or string. */
export interface OnsetResult {
  /** λ* of the most dangerous mode: the smallest factor on (Ra, Ma) that reaches onset [-]; Infinity if none. */
  margin: number;
  /** Critical wavenumber of that mode [1/d]; 0 for a long-wave mode; NaN when the margin is infinite. */
  criticalWavenumber: number;
  /** True when the most dangerous mode is the long-wave deformational one (surface thinning). */
  longWave: boolean;
  /** λ* of the flat-surface cellular problem (same Ra, Ma, Bi; crispation ignored) [-]. */
  cellMargin: number;
  /** Critical wavenumber of the flat-surface problem [1/d]; NaN if its margin is infinite. */
  cellWavenumber: number;
  /** λ* of the deformational long-wave mode (k → 0) [-]; Infinity when the surface is flat or none exists. */
  longWaveMargin: number;
  /** λ*·Ra of the most dangerous mode [-] (NaN if the margin is infinite). */
  onsetRayleigh: number;
  /** λ*·Ma of the most dangerous mode [-] (NaN if the margin is infinite). */
  onsetMarangoni: number;
  /** Share of buoyancy in the drive at onset, 0..1 (see classifyRegime for the rule); NaN if the margin is infinite. */
  buoyancyShare: number;
  /** 'quiet' if margin ≥ 1, else the mechanism that would act. */
  regime: Regime;
  /** What sets in at onset even when quiet; 'none' when the margin is infinite. */
  mechanism: Exclude<Regime, 'quiet'> | 'none';
}

/** Options of onsetMargin. */
export interface OnsetMarginOptions {
  /**
   * Expected critical wavenumber of the flat cellular mode [1/d], finite and > 0: for example the
   * cellWavenumber of a neighbouring depth in a sweep. The search brackets the minimum around it
   * first and falls back to the full coarse scan when that bracket fails; it changes the cost,
   * not the answer. Ignored when Ra and Ma have opposite signs (the neutral curve can then have
   * two cellular minima and only the full scan compares them). Omit for a cold search.
   */
  wavenumberHint?: number;
}

/** Options of neutralCurve. */
export interface NeutralCurveOptions {
  /** Smallest wavenumber [1/d], > 0; default 0.1. */
  wavenumberMin?: number;
  /** Largest wavenumber [1/d]; default 8. */
  wavenumberMax?: number;
  /** Number of points (≥ 2), spaced evenly in k; default 80. */
  points?: number;
}

/** Sampled neutral curve along the ray (λ·Ra, λ·Ma). */
export interface NeutralCurve {
  wavenumber: number[];
  factor: number[];
  rayleigh: number[];
  marangoni: number[];
}

/** A critical value and the wavenumber where it is reached. */
export interface CriticalValue {
  /** Critical Rayleigh or Marangoni number [-]; Infinity if no stationary onset exists. */
  value: number;
  /** Critical wavenumber [1/d]; 0 when the minimum lies at k → 0. */
  wavenumber: number;
}
