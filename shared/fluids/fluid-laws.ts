import type { FluidKind } from '../schemas/fluids';

/**
 * A fluid's temperature laws in SI, as the evaluation needs them (no text, no sources).
 * ρ(T) = ρ_ref(1 − β(T − T_ref)); μ(T) = A·exp(B/T); σ(T) = σ_ref + (dσ/dT)(T − T_ref);
 * k, c_p (or κ), D and dσ/dc constant.
 */
export interface FluidLaws {
  readonly kind: FluidKind;
  /** T_ref [K] */
  readonly referenceTemperature: number;
  /** Stated validity range [K], or null. */
  readonly validFrom: number | null;
  readonly validTo: number | null;
  /** ρ_ref [kg/m³] */
  readonly density: number;
  /** β [1/K] */
  readonly expansion: number;
  /** A [Pa·s] of μ = A exp(B/T) */
  readonly viscosityPreExponential: number;
  /** B [K] of μ = A exp(B/T); 0 = constant viscosity */
  readonly viscosityActivationTemperature: number;
  /** σ_ref [N/m] */
  readonly surfaceTension: number;
  /** dσ/dT [N/(m·K)] */
  readonly surfaceTensionSlope: number;
  /** k [W/(m·K)] */
  readonly conductivity: number;
  /** c_p [J/(kg·K)], or null when κ is given instead */
  readonly heatCapacity: number | null;
  /** κ [m²/s], or null when c_p is given instead */
  readonly thermalDiffusivity: number | null;
  /** D [m²/s] or null */
  readonly soluteDiffusivity: number | null;
  /** dσ/dc [N/m per unit mass fraction] or null */
  readonly soluteSurfaceTensionSlope: number | null;
}

/** Fluid properties at one temperature, SI. */
export interface FluidPropertiesAt {
  readonly temperature: number;
  readonly density: number;
  readonly viscosity: number;
  readonly kinematicViscosity: number;
  readonly surfaceTension: number;
  readonly surfaceTensionSlope: number;
  readonly conductivity: number;
  readonly heatCapacity: number;
  readonly thermalDiffusivity: number;
  readonly expansion: number;
  readonly soluteDiffusivity: number | null;
  readonly soluteSurfaceTensionSlope: number | null;
}
